import "server-only";
import { randomBytes } from "node:crypto";
import type { z } from "zod";
import { getDb, type Upload } from "@/models";
import type { UploadKind } from "@/models/upload";
import { AppError, notFound } from "@/lib/errors";
import { fileStore, MAX_UPLOAD_BYTES } from "@/lib/storage";
import { reencodeUnderlay } from "@/lib/storage/image-decode";
import type { updateUploadSchema } from "@/lib/validation/plot";
import type { UploadDto } from "@/lib/dto/upload";
import { plain } from "./plain";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";

const UPLOAD_KEYS = [
  "id",
  "productionId",
  "kind",
  "fileName",
  "contentType",
  "sizeBytes",
  "widthPx",
  "heightPx",
  "metresPerPixel",
  "offsetX",
  "offsetY",
  "rotationDeg",
  "opacity",
  "version",
  "updatedAt",
] as const;

export const toUploadDto = (u: Upload): UploadDto => ({
  ...plain(u, UPLOAD_KEYS),
  locked: Boolean(u.locked), // TINYINT in MariaDB
  url: `/api/productions/${u.productionId}/uploads/${u.id}/file`,
});

export async function getUploadsByProduction({
  productionId,
  kind,
}: {
  productionId: number;
  kind?: UploadKind;
}): Promise<UploadDto[]> {
  const rows = await getDb().Upload.findAll({
    where: { productionId, ...(kind ? { kind } : {}) },
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
  });
  return rows.map(toUploadDto);
}

/**
 * Stores an underlay image: decoded by sharp (PNG, JPEG or WebP by its content, never its name; a
 * damaged file or one with too many pixels is refused) and stored as sharp writes it again. The first
 * placement puts the image's top-left corner upstage-left-ish so it lands near the stage.
 */
export async function createUnderlay({
  productionId,
  userId,
  fileName,
  bytes,
}: {
  productionId: number;
  userId: number;
  fileName: string;
  bytes: Uint8Array;
}) {
  if (bytes.byteLength === 0)
    throw new AppError("bad_request", "The file is empty.", { fieldErrors: { file: ["the file is empty"] } });
  if (bytes.byteLength > MAX_UPLOAD_BYTES) {
    throw new AppError(
      "too_large",
      `The file is ${(bytes.byteLength / 1048576).toFixed(1)} MB; the limit is ${MAX_UPLOAD_BYTES / 1048576} MB.`,
      { fieldErrors: { file: ["too large"] } },
    );
  }
  const image = await reencodeUnderlay(bytes);
  const key = `p${productionId}/underlay-${Date.now()}-${randomBytes(6).toString("hex")}`;
  await fileStore().put(key, image.bytes, image.type);
  const { Upload } = getDb();
  try {
    return await inTransaction(async (transaction) => {
      const row = await Upload.create(
        {
          productionId,
          kind: "underlay",
          fileName: fileName.slice(0, 200) || "groundplan",
          storageKey: key,
          contentType: image.type,
          sizeBytes: image.bytes.byteLength,
          widthPx: image.width,
          heightPx: image.height,
          uploadedBy: userId,
          // 1 cm a pixel, centred on the centre line 4 m upstage: a starting guess that lands on the stage, to calibrate from.
          metresPerPixel: 0.01,
          offsetX: -(image.width * 0.01) / 2,
          offsetY: 4 + (image.height * 0.01) / 2,
        },
        { transaction },
      );
      await recordChange(
        { productionId, userId, entity: "upload", entityId: row.id, action: "create", after: toUploadDto(row) },
        transaction,
      );
      return toUploadDto(row);
    });
  } catch (err) {
    await fileStore().delete(key); // nothing half-saved: no orphan file without its row
    throw err;
  }
}

export async function readUploadFile({ productionId, uploadId }: { productionId: number; uploadId: number }) {
  const row = await getDb().Upload.findOne({ where: { productionId, id: uploadId } });
  if (!row) throw notFound("Upload");
  const bytes = await fileStore().get(row.storageKey);
  if (!bytes) throw notFound("The stored file");
  return { bytes, contentType: row.contentType, fileName: row.fileName };
}

export async function updateUpload({
  productionId,
  uploadId,
  userId,
  patch,
}: {
  productionId: number;
  uploadId: number;
  userId: number;
  patch: z.infer<typeof updateUploadSchema>;
}) {
  const { Upload } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return inTransaction(async (transaction) => {
    // Only underlays are calibrated here; a focus photo changes through its fixture (lib/data/focus-photos.ts).
    const current = await Upload.findOne({ where: { productionId, id: uploadId, kind: "underlay" }, transaction });
    if (!current) throw notFound("Upload");
    // A locked underlay keeps its place; only unlocking (or opacity) is accepted until then.
    const moves = ["metresPerPixel", "offsetX", "offsetY", "rotationDeg"].filter((k) => k in changes);
    if (current.locked && changes.locked !== false && moves.length) {
      throw new AppError("bad_request", "The underlay is locked; unlock it before moving or rescaling it.", {
        fieldErrors: Object.fromEntries(moves.map((k) => [k, ["the underlay is locked"]])),
      });
    }
    const { before, after } = await versionedUpdate({
      model: Upload,
      scope: { productionId },
      id: uploadId,
      version,
      changes,
      toDto: toUploadDto,
      what: "Underlay",
      transaction,
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "upload",
        entityId: uploadId,
        action: "update",
        before: toUploadDto(before),
        after: toUploadDto(after),
      },
      transaction,
    );
    return toUploadDto(after);
  });
}

export async function deleteUpload({
  productionId,
  uploadId,
  userId,
}: {
  productionId: number;
  uploadId: number;
  userId: number;
}) {
  const { Upload } = getDb();
  const key = await inTransaction(async (transaction) => {
    // A focus photo is removed through its fixture, under the fixture's version.
    const row = await Upload.findOne({
      where: { productionId, id: uploadId, kind: ["underlay", "import"] },
      transaction,
    });
    if (!row) throw notFound("Upload");
    await row.destroy({ transaction });
    await recordChange(
      { productionId, userId, entity: "upload", entityId: uploadId, action: "delete", before: toUploadDto(row) },
      transaction,
    );
    return row.storageKey;
  });
  await fileStore().delete(key);
}
