/**
 * JSON reading that refuses hostile text before it can cost anything: too large, nested too
 * deeply for the parser's recursion, keys that name an object prototype, and lists longer than
 * any real project. Pure: reads a string, returns a value or messages.
 */

/** Largest text accepted, in characters (a 100,000-element project is about 40 MB). */
export const MAX_TEXT_CHARS = 64 * 1024 * 1024;
/** Deepest nesting of objects and lists accepted (a real project file is 6 levels deep). */
export const MAX_DEPTH = 40;
/** Longest list accepted anywhere in the file. */
export const MAX_LIST = 200_000;

const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

export type SafeJsonResult =
  { ok: true; value: unknown; warnings: string[] } | { ok: false; errors: string[] };

/**
 * Parse JSON text for a project file.
 *
 * @example
 *   safeJsonParse('{"a": 1}'); // { ok: true, value: { a: 1 }, warnings: [] }
 */
export function safeJsonParse(text: unknown): SafeJsonResult {
  if (typeof text !== 'string') return fail('the file could not be read as text');
  if (text.length > MAX_TEXT_CHARS) {
    const mb = (text.length / 1024 / 1024).toFixed(1);
    return fail(`the file is ${mb} MB; the most Dropline opens is ${MAX_TEXT_CHARS / 1024 / 1024} MB`);
  }
  const warnings: string[] = [];
  let body = text;
  if (body.charCodeAt(0) === 0xfeff) {
    // Some editors save a byte-order mark; JSON (RFC 8259 §8.1) lets a reader ignore it.
    body = body.slice(1);
    warnings.push('the file starts with a byte-order mark; it was ignored');
  }
  if (body.trim() === '') return fail('the file is empty; a project file is a JSON object');

  const depthError = checkDepth(body);
  if (depthError) return fail(depthError);

  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    const hint = /\b(NaN|-?Infinity|undefined)\b/.test(body)
      ? ' (NaN, Infinity and undefined are not JSON values; write a number or remove the field)'
      : '';
    return fail(`the file is not valid JSON: ${why}${hint}`);
  }

  const shapeErrors = checkKeysAndLists(value);
  if (shapeErrors.length > 0) return { ok: false, errors: shapeErrors };
  return { ok: true, value, warnings };
}

function fail(message: string): SafeJsonResult {
  return { ok: false, errors: [message] };
}

/** Nesting depth measured on the raw text, so JSON.parse never recurses past MAX_DEPTH. */
function checkDepth(text: string): string | null {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
      continue;
    }
    if (c === 0x22) inString = true;
    else if (c === 0x7b || c === 0x5b) {
      depth++;
      if (depth > MAX_DEPTH) {
        return `the file is nested more than ${MAX_DEPTH} levels deep (at character ${i + 1}); a project file is about 6 levels deep`;
      }
    } else if (c === 0x7d || c === 0x5d) depth--;
  }
  return null;
}

/** Walks the parsed value without recursion; reports prototype keys and over-long lists by path. */
function checkKeysAndLists(root: unknown): string[] {
  const errors: string[] = [];
  const stack: { value: unknown; path: string }[] = [{ value: root, path: '' }];
  while (stack.length > 0 && errors.length < 20) {
    const { value, path } = stack.pop()!;
    if (Array.isArray(value)) {
      if (value.length > MAX_LIST) {
        errors.push(
          `${path || 'the file'} lists ${value.length} items; the most Dropline accepts is ${MAX_LIST}`,
        );
        continue;
      }
      for (let i = value.length - 1; i >= 0; i--) stack.push({ value: value[i], path: `${path}[${i}]` });
    } else if (value !== null && typeof value === 'object') {
      for (const key of Object.keys(value)) {
        const at = path ? `${path}.${key}` : key;
        if (FORBIDDEN_KEYS.has(key)) {
          errors.push(
            `${at}: the key "${key}" is not allowed in a project file (it could alter built-in objects); remove it`,
          );
          continue;
        }
        stack.push({ value: (value as Record<string, unknown>)[key], path: at });
      }
    }
  }
  return errors;
}
