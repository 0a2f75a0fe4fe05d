/**
 * A read-mostly record keyed by element id whose values are built the first time they are read.
 * It behaves like a plain object for `rec[id]`, `id in rec`, `Object.keys`, `Object.values`,
 * spreading and `JSON.stringify`; assignments and deletions are kept as overrides, so code that
 * adds to results still works. It lets a 100,000-element solve skip building result objects
 * nobody looks at.
 */
import type { IdsByPosition } from './idList.ts';

export function lazyRecord<T extends object>(
  ids: IdsByPosition,
  index: ReadonlyMap<string, number>,
  include: (i: number) => boolean,
  make: (i: number) => T,
): Record<string, T> {
  // Made on the first read: a solve whose results nobody reads allocates nothing per element here.
  let built: (T | undefined)[] | undefined;
  const overrides = new Map<string, T | undefined>();
  let keys: string[] | undefined;

  const lookup = (key: string | symbol): T | undefined => {
    if (typeof key !== 'string') return undefined;
    if (overrides.has(key)) return overrides.get(key);
    const i = index.get(key);
    if (i === undefined || ids.at(i) !== key || !include(i)) return undefined;
    built ??= new Array<T | undefined>(ids.length);
    let value = built[i];
    if (value === undefined) {
      value = make(i);
      built[i] = value;
    }
    return value;
  };
  const ownKeys = (): string[] => {
    if (!keys) {
      keys = [];
      for (let i = 0; i < ids.length; i++) {
        const id = ids.at(i);
        if (id !== '' && include(i)) keys.push(id);
      }
    }
    if (overrides.size === 0) return keys;
    const out = keys.filter((k) => !overrides.has(k) || overrides.get(k) !== undefined);
    for (const [k, v] of overrides) if (v !== undefined && !out.includes(k)) out.push(k);
    return out;
  };

  return new Proxy(Object.create(null) as Record<string, T>, {
    get: (_t, key) => lookup(key),
    has: (_t, key) => lookup(key) !== undefined,
    ownKeys,
    getOwnPropertyDescriptor: (_t, key) => {
      const value = lookup(key);
      return value === undefined
        ? undefined
        : { value, writable: true, enumerable: true, configurable: true };
    },
    set: (_t, key, value: T) => {
      if (typeof key !== 'string') return false;
      overrides.set(key, value);
      return true;
    },
    defineProperty: (_t, key, descriptor) => {
      if (typeof key !== 'string' || !('value' in descriptor)) return false;
      overrides.set(key, descriptor.value as T);
      return true;
    },
    deleteProperty: (_t, key) => {
      if (typeof key === 'string') overrides.set(key, undefined);
      return true;
    },
  });
}
