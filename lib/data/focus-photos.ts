import "server-only";
// Focus photos: one picture a fixture, taken on the deck during the focus call. Stored through the
// uploads service (an Upload row of kind "focus-photo" and files in the file store) and linked from the
// fixture, whose version guards the link like any other field. sharp reads the header (type by content,
// pixel limit), then decodes the image (a file that only starts like an image is refused), turns it upright from the
// camera's orientation tag, drops its metadata (a phone photo carries the GPS position) and keeps two
// JPEG copies: one for the screen, and a small one for the chart, the print view and the PDF.
import { randomBytes } from "node:crypto";
import { getDb } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { fileStore, MAX_UPLOAD_BYTES } from "@/lib/storage";
import { decoder, readImageHeader, refusal } from "@/lib/storage/image-decode";
import type { ChartPhoto } from "@/lib/focus/chart-model";
import type { FixtureDto } from "@/lib/dto/fixture";
import { getFixtureById, recordFixtureUpdate, toFixtureRecord } from "./fixtures";
import { toUploadDto } from "./uploads";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";

/** Same cap as every upload: a full-size phone photo (3–12 MB) fits. */
export const MAX_FOCUS_PHOTO_BYTES = MAX_UPLOAD_BYTES;
/** Long side of the kept copy and of the chart's copy, in pixels. */
const FULL_PX = 1600;
export const THUMB_PX = 320;

const thumbKeyOf = (key: string) => key.replace(/-full\.jpg$/, "-thumb.jpg");
const mb = (n: number) => `${(n / 1048576).toFixed(1)} MB`;

type Prepared = { full: Buffer; thumb: Buffer; width: number; height: number };

/** Checks and shrinks the picture; throws an AppError that names the file and says what to do. */
export async function preparePhoto(bytes: Uint8Array): Promise<Prepared> {
  if (bytes.byteLength === 0)
    throw new AppError("bad_request", "The file is empty. Take the photo again.", {
      fieldErrors: { file: ["the file is empty"] },
    });
  if (bytes.byteLength > MAX_FOCUS_PHOTO_BYTES) {
    throw new AppError(
      "too_large",
      `The photo is ${mb(bytes.byteLength)}; the limit is ${MAX_FOCUS_PHOTO_BYTES / 1048576} MB.`,
      { fieldErrors: { file: ["over the size limit"] } },
    );
  }
  await readImageHeader(bytes, "photo");
  try {
    const upright = () => decoder(bytes).rotate().flatten({ background: "#ffffff" });
    const [full, thumb] = await Promise.all([
      upright()
        .resize({ width: FULL_PX, height: FULL_PX, fit: "inside", withoutEnlargement: true })
        .jpeg({ quality: 82 })
        .toBuffer({ resolveWithObject: true }),
      upright()
        .resize({ width: THUMB_PX, height: THUMB_PX, fit: "inside", withoutEnlargement: true })
        .jpeg({ quality: 70 })
        .toBuffer(),
    ]);
    return { full: full.data, thumb, width: full.info.width, height: full.info.height };
  } catch (err) {
    throw refusal(err, "photo");
  }
}

async function fixtureRow(productionId: number, fixtureId: number) {
  const row = await getDb().Fixture.findOne({ where: { productionId, id: fixtureId } });
  if (!row) throw notFound("Fixture");
  return row;
}

/**
 * Sets (or replaces) a fixture's focus photo at the version the client read: the files are written first
 * and removed again if the database write fails, so nothing is left half-saved; the old photo goes after.
 */
export async function setFocusPhoto(o: {
  productionId: number;
  fixtureId: number;
  version: number;
  userId: number;
  fileName: string;
  bytes: Uint8Array;
}): Promise<FixtureDto> {
  const { productionId, fixtureId, version, userId } = o;
  await fixtureRow(productionId, fixtureId);
  const photo = await preparePhoto(o.bytes);
  const key = `p${productionId}/focus-${fixtureId}-${Date.now()}-${randomBytes(6).toString("hex")}-full.jpg`;
  const store = fileStore();
  await Promise.all([store.put(key, photo.full, "image/jpeg"), store.put(thumbKeyOf(key), photo.thumb, "image/jpeg")]);
  const { Upload, Fixture } = getDb();
  let oldKey: string | null = null;
  try {
    await inTransaction(async (transaction) => {
      const upload = await Upload.create(
        {
          productionId,
          kind: "focus-photo",
          fileName: o.fileName.slice(0, 200) || "focus-photo.jpg",
          storageKey: key,
          contentType: "image/jpeg",
          sizeBytes: photo.full.byteLength,
          widthPx: photo.width,
          heightPx: photo.height,
          uploadedBy: userId,
        },
        { transaction },
      );
      const { before, after } = await versionedUpdate({
        model: Fixture,
        scope: { productionId },
        id: fixtureId,
        version,
        changes: { focusPhotoUploadId: upload.id },
        toDto: toFixtureRecord,
        what: "Fixture",
        transaction,
      });
      await recordChange(
        { productionId, userId, entity: "upload", entityId: upload.id, action: "create", after: toUploadDto(upload) },
        transaction,
      );
      await recordFixtureUpdate({ productionId, userId, fixtureId, before, after }, transaction);
      if (before.focusPhotoUploadId != null)
        oldKey = await dropUpload(productionId, before.focusPhotoUploadId, userId, transaction);
    });
  } catch (err) {
    await Promise.all([store.delete(key), store.delete(thumbKeyOf(key))]);
    throw err;
  }
  if (oldKey) await Promise.all([store.delete(oldKey), store.delete(thumbKeyOf(oldKey))]);
  return (await getFixtureById({ productionId, fixtureId }))!;
}

async function dropUpload(
  productionId: number,
  uploadId: number,
  userId: number,
  transaction: import("sequelize").Transaction,
): Promise<string | null> {
  const row = await getDb().Upload.findOne({ where: { productionId, id: uploadId, kind: "focus-photo" }, transaction });
  if (!row) return null;
  await row.destroy({ transaction });
  await recordChange(
    { productionId, userId, entity: "upload", entityId: uploadId, action: "delete", before: toUploadDto(row) },
    transaction,
  );
  return row.storageKey;
}

/** Removes the photo at the version the client read (409 when someone changed the fixture first). */
export async function removeFocusPhoto(o: {
  productionId: number;
  fixtureId: number;
  version: number;
  userId: number;
}): Promise<FixtureDto> {
  const { productionId, fixtureId, version, userId } = o;
  const existing = await fixtureRow(productionId, fixtureId);
  if (existing.focusPhotoUploadId == null && existing.version === version) {
    throw new AppError("bad_request", "This unit has no focus photo to remove.", {
      fieldErrors: { file: ["no photo"] },
    });
  }
  const { Fixture } = getDb();
  let oldKey: string | null = null;
  await inTransaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Fixture,
      scope: { productionId },
      id: fixtureId,
      version,
      changes: { focusPhotoUploadId: null },
      toDto: toFixtureRecord,
      what: "Fixture",
      transaction,
    });
    await recordFixtureUpdate({ productionId, userId, fixtureId, before, after }, transaction);
    if (before.focusPhotoUploadId != null)
      oldKey = await dropUpload(productionId, before.focusPhotoUploadId, userId, transaction);
  });
  if (oldKey) await Promise.all([fileStore().delete(oldKey), fileStore().delete(thumbKeyOf(oldKey))]);
  return (await getFixtureById({ productionId, fixtureId }))!;
}

/** The fixture's current photo, full or small; 404 when it has none. */
export async function readFocusPhoto({
  productionId,
  fixtureId,
  size,
}: {
  productionId: number;
  fixtureId: number;
  size: "full" | "thumb";
}) {
  const fixture = await fixtureRow(productionId, fixtureId);
  if (fixture.focusPhotoUploadId == null) throw notFound("The focus photo");
  const upload = await getDb().Upload.findOne({
    where: { productionId, id: fixture.focusPhotoUploadId, kind: "focus-photo" },
  });
  if (!upload) throw notFound("The focus photo");
  const bytes = await fileStore().get(size === "thumb" ? thumbKeyOf(upload.storageKey) : upload.storageKey);
  if (!bytes) throw notFound("The stored photo");
  return { bytes, contentType: upload.contentType, uploadId: upload.id };
}

/**
 * The small copies as data: URLs, by upload id, for the server's PDF (its browser page has no session to
 * fetch them with). A small copy is 10–30 KB, so a part of 20 pages carries at most a few MB.
 */
export async function focusPhotoThumbs({
  productionId,
  uploadIds,
}: {
  productionId: number;
  uploadIds: number[];
}): Promise<Map<number, string>> {
  const out = new Map<number, string>();
  if (!uploadIds.length) return out;
  const rows = await getDb().Upload.findAll({
    where: { productionId, id: [...new Set(uploadIds)], kind: "focus-photo" },
    attributes: ["id", "storageKey"],
  });
  const store = fileStore();
  for (let i = 0; i < rows.length; i += 32) {
    await Promise.all(
      rows.slice(i, i + 32).map(async (r) => {
        const bytes = await store.get(thumbKeyOf(r.storageKey));
        if (bytes) out.set(r.id, `data:image/jpeg;base64,${Buffer.from(bytes).toString("base64")}`);
      }),
    );
  }
  return out;
}

/** Charts ready for the server's PDF: each photo as its small copy inline, without a link (the PDF has no session). */
export async function withEmbeddedPhotos<C extends { photo: ChartPhoto | null }>(
  productionId: number,
  charts: C[],
): Promise<C[]> {
  const ids = charts.flatMap((c) => (c.photo ? [c.photo.uploadId] : []));
  if (!ids.length) return charts;
  const thumbs = await focusPhotoThumbs({ productionId, uploadIds: ids });
  return charts.map((c) => {
    if (!c.photo) return c;
    const src = thumbs.get(c.photo.uploadId);
    return { ...c, photo: src ? { ...c.photo, thumbSrc: src, href: "" } : null };
  });
}
