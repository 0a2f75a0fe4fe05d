import { describe, expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { MAX_DEPTH, MAX_LIST, MAX_TEXT_CHARS } from '../../../src/model/safeJson.ts';
import { smallDoc, textWith } from './docBuilder.ts';

function refused(text: string): string[] {
  const r = parseDocument(text);
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.errors;
}

describe('hostile and broken input is refused with a message, never a crash', () => {
  test('empty and blank files', () => {
    expect(refused('')).toEqual(['the file is empty; a project file is a JSON object']);
    expect(refused(' \n\t ')).toEqual(['the file is empty; a project file is a JSON object']);
  });

  test('text that is not JSON', () => {
    expect(refused('format: dropline-project')[0]).toMatch(/^the file is not valid JSON: /);
    expect(refused('{"format": "dropline-project",')[0]).toMatch(/^the file is not valid JSON: /);
  });

  test('NaN and Infinity literals get a hint', () => {
    const text = serializeDocument(smallDoc()).replace('"lengthM": 18', '"lengthM": NaN');
    expect(refused(text)[0]).toMatch(/NaN, Infinity and undefined are not JSON values/);
    const text2 = serializeDocument(smallDoc()).replace('"lengthM": 18', '"lengthM": -Infinity');
    expect(refused(text2)[0]).toMatch(/not valid JSON.*not JSON values/);
  });

  test('prototype keys anywhere', () => {
    for (const key of ['__proto__', 'constructor', 'prototype']) {
      const text = serializeDocument(smallDoc()).replace(
        '"lengthM": 18',
        `"${key}": {"polluted": true}, "lengthM": 18`,
      );
      const errors = refused(text);
      expect(errors).toEqual([
        `cables[1].${key}: the key "${key}" is not allowed in a project file (it could alter built-in objects); remove it`,
      ]);
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  test('deep nesting is refused before JSON.parse recurses', () => {
    const deep = `${'['.repeat(1_000_000)}${']'.repeat(1_000_000)}`;
    expect(refused(deep)[0]).toMatch(new RegExp(`nested more than ${MAX_DEPTH} levels deep`));
    // Brackets inside strings do not count.
    const inString = textWith((d) => (d.details.notes = '['.repeat(5000)));
    expect(parseDocument(inString).ok).toBe(true);
  });

  test('huge lists', () => {
    const text = textWith((d) => (d.nodes = new Array(MAX_LIST + 1).fill(0)));
    expect(refused(text)).toEqual([
      `nodes lists ${MAX_LIST + 1} items; the most Dropline accepts is ${MAX_LIST}`,
    ]);
  });

  test('too many elements in total', () => {
    const text = textWith((d) => {
      d.nodes = new Array(MAX_LIST).fill(0);
      d.cables = [0];
    });
    expect(refused(text)[0]).toMatch(
      /^project file: 200001 elements \(nodes and cables\); the most Dropline opens is 200000/,
    );
  });

  test('huge files', () => {
    const text = ' '.repeat(MAX_TEXT_CHARS + 1);
    expect(refused(text)[0]).toMatch(/^the file is 64\.0 MB; the most Dropline opens is 64 MB/);
  });

  test('a byte-order mark is ignored with a warning (RFC 8259 §8.1 lets a reader ignore it)', () => {
    const r = parseDocument(`\uFEFF${serializeDocument(smallDoc())}`);
    expect(r.ok && r.warnings).toEqual(['the file starts with a byte-order mark; it was ignored']);
  });

  test('not a string at all', () => {
    expect(parseDocument(undefined as unknown as string)).toEqual({
      ok: false,
      errors: ['the file could not be read as text'],
    });
  });

  test('wrong types at every level do not throw', () => {
    const shapes = ['null', '1', '"x"', 'true', '{}', '{"format": "dropline-project"}'];
    const fields = ['details', 'settings', 'nodes', 'cables'];
    for (const shape of shapes) {
      expect(parseDocument(shape).ok).toBe(false);
      for (const field of fields) {
        const text = textWith((d) => (d[field] = JSON.parse(shape)));
        const r = parseDocument(text);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.errors.length).toBeGreaterThan(0);
      }
    }
    const r = parseDocument(textWith((d) => (d.nodes = [null, 1, 'x', [], { kind: 'load' }])));
    expect(r.ok).toBe(false);
  });

  test('parsing does not touch the input document objects (pure)', () => {
    const doc = smallDoc();
    const before = JSON.stringify(doc);
    parseDocument(serializeDocument(doc).replace('"lengthM": 18', '"lengthM": -1'));
    expect(JSON.stringify(doc)).toBe(before);
  });

  test('hundreds of errors are summarised', () => {
    const text = textWith((d) => {
      for (let i = 0; i < 200; i++) d.nodes.push({ kind: 'load', id: `X${i}` });
    });
    const errors = refused(text);
    expect(errors).toHaveLength(51);
    expect(errors[50]).toMatch(/^… and \d+ more problems/);
  });
});
