// The outbox on the device: one IndexedDB object store, one record per unit, so what was marked on deck
// survives a reload, a closed tab or a flat battery until it is sent. A few lines of IndexedDB rather than a
// library: the outbox needs get-all, put and delete, nothing more.
import type { OutboxEntry } from "./outbox";
import { entryKey } from "./outbox";

const DB_NAME = "throwline-offline";
const STORE = "focus-outbox";

function openDb(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = indexedDB.open(DB_NAME, 1);
    req.onupgradeneeded = () => req.result.createObjectStore(STORE);
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
}

let db: Promise<IDBDatabase> | null = null;

async function withStore<T>(mode: IDBTransactionMode, work: (s: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  db ??= openDb();
  const store = (await db).transaction(STORE, mode).objectStore(STORE);
  return new Promise((resolve, reject) => {
    const req = work(store);
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
}

export const outboxAvailable = () => typeof indexedDB !== "undefined";

/** Every waiting entry of one production, oldest first (they are sent in the order they were made). */
export async function readOutbox(productionId: number): Promise<OutboxEntry[]> {
  const all = await withStore<OutboxEntry[]>("readonly", (s) => s.getAll());
  return all.filter((e) => e.productionId === productionId).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
}

export async function putEntry(entry: OutboxEntry): Promise<void> {
  await withStore("readwrite", (s) => s.put(entry, entryKey(entry.productionId, entry.fixtureId)));
}

export async function deleteEntry(productionId: number, fixtureId: number): Promise<void> {
  await withStore("readwrite", (s) => s.delete(entryKey(productionId, fixtureId)));
}
