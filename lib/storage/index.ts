import "server-only";
import { type Env, env } from "@/lib/env";
import type { FileStore } from "./file-store";
import { LocalDiskStore } from "./local-disk";
import { S3Store, type S3Settings } from "./s3-store";

export type { FileStore };

/** The S3 settings from the environment, or null when uploads stay on the local disk. */
export function s3SettingsFrom(e: Env): S3Settings | null {
  if (!e.S3_BUCKET) return null;
  return {
    bucket: e.S3_BUCKET,
    region: e.S3_REGION,
    endpoint: e.S3_ENDPOINT,
    credentials:
      e.S3_ACCESS_KEY_ID && e.S3_SECRET_ACCESS_KEY
        ? { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY }
        : undefined,
    forcePathStyle: e.S3_FORCE_PATH_STYLE === "true",
    prefix: e.S3_PREFIX,
  };
}

let store: FileStore | null = null;

/** One store per process: an S3 bucket when S3_BUCKET is set (several app servers), else the local disk. */
export function fileStore(): FileStore {
  if (store) return store;
  const s3 = s3SettingsFrom(env());
  store = s3 ? new S3Store(s3) : new LocalDiskStore(env().STORAGE_DIR);
  return store;
}

/** Upload size cap: a groundplan scan at print resolution fits easily; anything bigger is refused. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
