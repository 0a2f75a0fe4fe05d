/**
 * Autosave to IndexedDB: every document change is written shortly after it happens, so a reload
 * or a crash loses at most the last fraction of a second. One record, the open project.
 */
import type { ProjectDocument } from '../../model/types.ts';

const DB = 'dropline';
const STORE = 'autosave';
const KEY = 'current';
/** Short, so a change is on disk before a user can reload; long enough to batch a burst of edits. */
export const AUTOSAVE_DELAY_MS = 250;

export interface SavedProject {
  /** The document as text (serializeDocument), read back through parseDocument like any file. */
  text: string;
  fileName: string | null;
  savedAt: string;
}

function openDb(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = indexedDB.open(DB, 1);
    req.onupgradeneeded = () => req.result.createObjectStore(STORE);
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error ?? new Error('IndexedDB could not be opened'));
  });
}

async function withStore<T>(mode: IDBTransactionMode, fn: (s: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  const db = await openDb();
  try {
    return await new Promise<T>((resolve, reject) => {
      const tx = db.transaction(STORE, mode);
      const req = fn(tx.objectStore(STORE));
      tx.oncomplete = () => resolve(req.result);
      tx.onerror = () => reject(tx.error ?? new Error('IndexedDB transaction failed'));
    });
  } finally {
    db.close();
  }
}

export async function readAutosave(): Promise<SavedProject | null> {
  if (typeof indexedDB === 'undefined') return null;
  const value = await withStore('readonly', (s) => s.get(KEY) as IDBRequest<SavedProject | undefined>);
  return value && typeof value.text === 'string' ? value : null;
}

export async function writeAutosave(saved: SavedProject): Promise<void> {
  if (typeof indexedDB === 'undefined') return;
  await withStore('readwrite', (s) => s.put(saved, KEY));
}

/** Debounced writer; `flush` writes at once (on page hide). */
export function createAutosaver(serialize: (doc: ProjectDocument) => string, onError: (e: unknown) => void) {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let pending: { doc: ProjectDocument; fileName: string | null } | null = null;
  const write = () => {
    timer = null;
    if (!pending) return;
    const { doc, fileName } = pending;
    pending = null;
    writeAutosave({ text: serialize(doc), fileName, savedAt: new Date().toISOString() }).catch(onError);
  };
  return {
    schedule(doc: ProjectDocument, fileName: string | null) {
      pending = { doc, fileName };
      if (timer) clearTimeout(timer);
      timer = setTimeout(write, AUTOSAVE_DELAY_MS);
    },
    flush() {
      if (timer) clearTimeout(timer);
      write();
    },
  };
}
