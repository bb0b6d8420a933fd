import "server-only";
import { mkdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import { randomBytes } from "node:crypto";
import path from "node:path";
import { checkStorageKey, type FileStore } from "./file-store";

/** Files under one folder, for a single app server (`npm start`). */
export class LocalDiskStore implements FileStore {
  readonly description: string;

  constructor(private readonly root: string) {
    this.description = `local disk (${root})`;
  }

  private pathOf(key: string) {
    return path.join(path.resolve(this.root), checkStorageKey(key));
  }

  // The disk keeps no content type: the upload's row holds it.
  async put(key: string, bytes: Uint8Array, _contentType?: string) {
    const file = this.pathOf(key);
    await mkdir(path.dirname(file), { recursive: true });
    // Written aside then renamed, so a reader never sees half a file (as with an object store's put).
    const partial = `${file}.${randomBytes(4).toString("hex")}.partial`;
    try {
      await writeFile(partial, bytes);
      await rename(partial, file);
    } catch (err) {
      await rm(partial, { force: true });
      throw err;
    }
  }

  async get(key: string) {
    try {
      return new Uint8Array(await readFile(this.pathOf(key)));
    } catch (err) {
      const code = (err as NodeJS.ErrnoException).code;
      if (code === "ENOENT" || code === "ENOTDIR") return null;
      throw err;
    }
  }

  async delete(key: string) {
    await rm(this.pathOf(key), { force: true });
  }
}
