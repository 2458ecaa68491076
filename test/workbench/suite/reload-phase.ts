// A real window reload in the web workbench reloads the page, and with it the extension host and this
// suite: test-web runs the suite again from the start. The reload test leaves a note before reloading;
// the suite's entry reads it and then runs only what checks the reloaded window, counting the results
// of the first life with its own. The note goes to the browser's IndexedDB (the extension host worker
// has it), which outlives the page; the workspace would not do: test-web keeps files written during a
// run in the page's memory.
export interface ReloadNote {
  /** Results of the tests that ran before the reload. */
  carried: { passed: number; failed: number; pending: number };
  /** The file the panel showed when the window reloaded. */
  panelUri: string;
}

/** Title prefix of the tests that run after the reload (the entry greps for it). */
export const AFTER_RELOAD = '[after reload]';

let note: ReloadNote | undefined;
let canReload = false;

const DB = 'assay-workbench-suite';
const STORE = 'notes';
const KEY = 'reload';

// The few IndexedDB members used here (the suite is type-checked without the DOM library).
interface Request<T> { result: T; error: unknown; onsuccess: (() => void) | null; onerror: (() => void) | null }
interface OpenRequest extends Request<Database> { onupgradeneeded: (() => void) | null }
interface Transaction { objectStore(name: string): Store; oncomplete: (() => void) | null; onerror: (() => void) | null; error: unknown }
interface Database { createObjectStore(name: string): unknown; transaction(store: string, mode: 'readonly' | 'readwrite'): Transaction; close(): void }
interface Store { get(key: string): Request<unknown>; put(value: unknown, key: string): Request<unknown>; delete(key: string): Request<unknown> }

function openDb(): Promise<Database> {
  const idb = (globalThis as unknown as { indexedDB?: { open(name: string, version: number): OpenRequest } }).indexedDB;
  if (idb === undefined) return Promise.reject(new Error('reload: this extension host has no IndexedDB to keep the note in'));
  return new Promise((resolve, reject) => {
    const r = idb.open(DB, 1);
    r.onupgradeneeded = () => { r.result.createObjectStore(STORE); };
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(new Error(`reload: IndexedDB did not open (${String(r.error)})`));
  });
}

/** Runs one request in its own transaction and resolves once the transaction has committed. */
async function withStore<T>(mode: 'readonly' | 'readwrite', act: (s: Store) => Request<T>): Promise<T> {
  const db = await openDb();
  try {
    return await new Promise<T>((resolve, reject) => {
      const tx = db.transaction(STORE, mode);
      const r = act(tx.objectStore(STORE));
      tx.oncomplete = () => resolve(r.result);
      tx.onerror = () => reject(new Error(`reload: IndexedDB failed (${String(tx.error)})`));
    });
  } finally {
    db.close();
  }
}

/** Called once by the web entry before the test files load: reads (and removes) the note if any. */
export async function readReloadNote(): Promise<ReloadNote | undefined> {
  canReload = true;
  const saved = await withStore('readonly', (s) => s.get(KEY));
  if (saved === undefined) return undefined;
  // Removed at once: a reload of the reloaded window must run the whole suite again, not loop.
  await withStore('readwrite', (s) => s.delete(KEY));
  note = saved as ReloadNote;
  return note;
}

/** Leaves the note and reads it back (a note that did not stick would make the reload run the suite again). */
export async function writeReloadNote(n: ReloadNote): Promise<void> {
  await withStore('readwrite', (s) => s.put(n, KEY));
  const back = await withStore('readonly', (s) => s.get(KEY));
  if (JSON.stringify(back) !== JSON.stringify(n)) throw new Error('reload: the note did not stick in IndexedDB');
}

/** The note of the first life, in the reloaded window; undefined before the reload. */
export function reloadNote(): ReloadNote | undefined {
  return note;
}

/** Whether this host's entry supports reloading (the web one; the desktop runner does not). */
export function reloadSupported(): boolean {
  return canReload;
}
