// Unfinished uploads kept in IndexedDB, so a reloaded or reopened page can resume them. Chromium
// keeps the File itself; when it can no longer be read, the person picks the same file again.

export interface PendingUpload {
  clipId: string;
  runId: string;
  file: File;
  name: string;
  size: number;
  lastModified: number;
  savedAt: number;
}

const DB_NAME = "wickmark-uploads";
const STORE = "pending";

function open(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = indexedDB.open(DB_NAME, 1);
    req.onupgradeneeded = () => {
      const store = req.result.createObjectStore(STORE, { keyPath: "clipId" });
      store.createIndex("runId", "runId");
    };
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
}

async function run<T>(mode: IDBTransactionMode, act: (store: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  const db = await open();
  try {
    return await new Promise<T>((resolve, reject) => {
      const tx = db.transaction(STORE, mode);
      const req = act(tx.objectStore(STORE));
      tx.oncomplete = () => resolve(req.result);
      tx.onerror = () => reject(tx.error ?? req.error);
      tx.onabort = () => reject(tx.error ?? new Error("The browser refused to keep the upload."));
    });
  } finally {
    db.close();
  }
}

/** Keeps the upload; a browser that cannot store the file (private mode, quota) just cannot resume after a reload. */
export async function savePending(runId: string, clipId: string, file: File): Promise<boolean> {
  const entry: PendingUpload = { clipId, runId, file, name: file.name, size: file.size, lastModified: file.lastModified, savedAt: Date.now() };
  try {
    await run("readwrite", (s) => s.put(entry));
    return true;
  } catch {
    return false;
  }
}

export async function listPending(runId: string): Promise<PendingUpload[]> {
  try {
    return await run("readonly", (s) => s.index("runId").getAll(runId) as IDBRequest<PendingUpload[]>);
  } catch {
    return [];
  }
}

export async function removePending(clipId: string): Promise<void> {
  await run("readwrite", (s) => s.delete(clipId)).catch(() => undefined);
}

/** Whether the kept file can still be read (a moved or changed original cannot). */
export async function readable(file: Blob | undefined): Promise<boolean> {
  if (!file || file.size === 0) return false;
  try {
    await file.slice(0, 1).arrayBuffer();
    await file.slice(file.size - 1).arrayBuffer();
    return true;
  } catch {
    return false;
  }
}

/** The file picked again is the same one: same name, size and modification time (when known). */
export function sameFile(picked: File, wanted: { name: string; size: number; lastModified?: number }): boolean {
  return picked.name === wanted.name && picked.size === wanted.size && (wanted.lastModified === undefined || picked.lastModified === wanted.lastModified);
}
