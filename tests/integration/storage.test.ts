// One test file, run against both upload stores: the local disk (the default for `npm start`) and an
// S3 bucket through the AWS SDK (the stand-in `npm test` starts, or one started here when run alone).
// Both must keep bytes exactly, answer a missing key with null, delete idempotently and refuse keys
// that could leave their folder or bucket prefix.
import { randomBytes } from "node:crypto";
import { existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import type { FileStore } from "@/lib/storage/file-store";
import { LocalDiskStore } from "@/lib/storage/local-disk";
import { S3Store, type S3Settings } from "@/lib/storage/s3-store";
import { freePort, startS3StandIn } from "./storage-stand-in";

const scratch = mkdtempSync(path.join(os.tmpdir(), "throwline-storage-test-"));
let ownStandIn: { stop: () => Promise<unknown> } | null = null;

/** The runner's S3 settings, or a stand-in of this file's own when the file runs without them. */
async function s3Settings(): Promise<S3Settings> {
  let e: Record<string, string | undefined> = process.env;
  if (!e.S3_BUCKET) {
    const standIn = await startS3StandIn({ port: await freePort(), dir: path.join(scratch, "s3") });
    ownStandIn = standIn;
    e = standIn.env;
  }
  return {
    bucket: e.S3_BUCKET as string,
    region: e.S3_REGION ?? "us-east-1",
    endpoint: e.S3_ENDPOINT,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID as string, secretAccessKey: e.S3_SECRET_ACCESS_KEY as string },
    forcePathStyle: e.S3_FORCE_PATH_STYLE === "true",
    // Each run in its own prefix, so nothing here meets the app servers' objects in the shared bucket.
    prefix: `storage-test-${randomBytes(4).toString("hex")}/`,
  };
}

afterAll(async () => {
  await ownStandIn?.stop();
  rmSync(scratch, { recursive: true, force: true });
});

const stores: [string, () => Promise<FileStore>][] = [
  ["local disk", async () => new LocalDiskStore(path.join(scratch, "disk"))],
  ["S3 bucket", async () => new S3Store(await s3Settings())],
];

describe.each(stores)("upload store: %s", (_name, make) => {
  let store: FileStore;
  beforeAll(async () => {
    store = await make();
  });

  it("gives back exactly the bytes it was given, every byte value and a 2 MB body", async () => {
    const everyByte = Uint8Array.from({ length: 256 }, (_, i) => i);
    const big = new Uint8Array(randomBytes(2 * 1024 * 1024));
    await store.put("p1/every-byte", everyByte, "application/octet-stream");
    await store.put("p1/photos/big.jpg", big, "image/jpeg");
    expect(Buffer.from((await store.get("p1/every-byte")) as Uint8Array).equals(Buffer.from(everyByte))).toBe(true);
    expect(Buffer.from((await store.get("p1/photos/big.jpg")) as Uint8Array).equals(Buffer.from(big))).toBe(true);
  });

  it("keeps an empty file as an empty file, not as missing", async () => {
    await store.put("p1/empty", new Uint8Array(), "text/plain");
    expect(await store.get("p1/empty")).toEqual(new Uint8Array());
  });

  it("answers a key never written with null", async () => {
    expect(await store.get("p1/never-written")).toBeNull();
    expect(await store.get("p404/nothing/here")).toBeNull();
  });

  it("replaces a file written again under the same key", async () => {
    await store.put("p2/underlay-1", new TextEncoder().encode("first"), "text/plain");
    await store.put("p2/underlay-1", new TextEncoder().encode("second, longer"), "text/plain");
    expect(new TextDecoder().decode((await store.get("p2/underlay-1")) as Uint8Array)).toBe("second, longer");
  });

  it("deletes, and deleting again (or a key never written) is not an error", async () => {
    await store.put("p3/gone", new Uint8Array([1, 2, 3]), "application/octet-stream");
    await store.delete("p3/gone");
    expect(await store.get("p3/gone")).toBeNull();
    await expect(store.delete("p3/gone")).resolves.toBeUndefined();
    await expect(store.delete("p3/never")).resolves.toBeUndefined();
  });

  it("keeps 40 files written at once apart", async () => {
    const bodies = Array.from({ length: 40 }, (_, i) => new Uint8Array(randomBytes(1000 + i)));
    await Promise.all(bodies.map((b, i) => store.put(`p4/many-${i}`, b, "application/octet-stream")));
    const back = await Promise.all(bodies.map((_, i) => store.get(`p4/many-${i}`)));
    back.forEach((b, i) => expect(Buffer.from(b as Uint8Array).equals(Buffer.from(bodies[i]))).toBe(true));
  });

  it("refuses keys that could climb out of its folder or prefix, before touching anything", async () => {
    for (const bad of ["../escape", "p1/../../etc/passwd", "/absolute", "p1//double", "", "p1/ spaces", "p1\\back"]) {
      await expect(store.put(bad, new Uint8Array([1]), "text/plain"), bad).rejects.toThrow(/Bad storage key/);
      await expect(store.get(bad), bad).rejects.toThrow(/Bad storage key/);
      await expect(store.delete(bad), bad).rejects.toThrow(/Bad storage key/);
    }
  });
});

describe("each store's own edges", () => {
  it("the local disk leaves no partial file behind and writes only under its folder", async () => {
    const root = path.join(scratch, "disk-only");
    const store = new LocalDiskStore(root);
    await store.put("p9/a/b/c", new Uint8Array([7]), "application/octet-stream");
    expect(readdirSync(path.join(root, "p9/a/b"))).toEqual(["c"]);
    expect(existsSync(path.join(scratch, "c"))).toBe(false);
  });

  it("an S3 endpoint that does not answer is a 503 with a true message, not a 500", async () => {
    const store = new S3Store({
      bucket: "nowhere",
      region: "us-east-1",
      endpoint: `http://127.0.0.1:${await freePort()}`, // nothing listens here
      credentials: { accessKeyId: "x", secretAccessKey: "y" },
      forcePathStyle: true,
    });
    const err = await store.get("p1/x").catch((e: unknown) => e);
    expect(err).toBeInstanceOf(AppError);
    expect((err as AppError).status).toBe(503);
    expect((err as AppError).message).toMatch(/file store is not answering/);
  });
});
