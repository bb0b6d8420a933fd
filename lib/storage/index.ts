import "server-only";
import { env } from "@/lib/env";
import type { FileStore } from "./file-store";
import { LocalDiskStore } from "./local-disk";

export type { FileStore };

let store: FileStore | null = null;

export function fileStore(): FileStore {
  store ??= new LocalDiskStore(env().STORAGE_DIR);
  return store;
}

/** Upload size cap: a groundplan scan at print resolution fits easily; anything bigger is refused. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
