import "server-only";
import { env } from "@/lib/env";
import { LocalDiskStore } from "./local-disk";

/** Where uploaded files live. The local disk is the embedded default; an object store can stand in. */
export interface FileStore {
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  get(key: string): Promise<Uint8Array | null>;
  delete(key: string): Promise<void>;
}

let store: FileStore | null = null;

export function fileStore(): FileStore {
  store ??= new LocalDiskStore(env().STORAGE_DIR);
  return store;
}

/** Upload size cap: a groundplan scan at print resolution fits easily; anything bigger is refused. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
