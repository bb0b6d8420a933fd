import { z } from "zod";
import { versionSchema } from "./common";

const planCoord = (what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .min(-200, { error: `${what} is far outside any venue (more than 200 m from the datum)` })
    .max(200, { error: `${what} is far outside any venue (more than 200 m from the datum)` });
const planPoint = z.object({ x: planCoord("x"), y: planCoord("y") }).strict();
const name = (max: number) =>
  z
    .string({ error: "Name is required" })
    .trim()
    .min(1, { error: "Name is required" })
    .max(max, { error: `Name must be at most ${max} characters` });

export const areaZoneFieldsSchema = z.object({
  name: name(60),
  polygon: z
    .array(planPoint, { error: "The area's outline must be a list of points" })
    .min(3, { error: "An area needs at least three corners" })
    .max(64, { error: "An area has at most 64 corners" }),
});
export const createAreaZoneSchema = areaZoneFieldsSchema.strict();
export const updateAreaZoneSchema = areaZoneFieldsSchema.partial().extend({ version: versionSchema }).strict();

const notPoint = (l: { x1?: number; y1?: number; x2?: number; y2?: number }) =>
  l.x1 === undefined ||
  l.x2 === undefined ||
  l.y1 === undefined ||
  l.y2 === undefined ||
  Math.hypot(l.x2 - l.x1, l.y2 - l.y1) > 1e-6;
export const landmarkFieldsSchema = z.object({
  name: name(60),
  x1: planCoord("x1"),
  y1: planCoord("y1"),
  x2: planCoord("x2"),
  y2: planCoord("y2"),
});
export const createLandmarkSchema = landmarkFieldsSchema
  .strict()
  .refine(notPoint, { error: "A landmark needs two different ends", path: ["x2"] });
export const updateLandmarkSchema = landmarkFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict()
  .refine(notPoint, { error: "A landmark needs two different ends", path: ["x2"] });

/** Calibration and display settings of an underlay. */
export const updateUploadSchema = z
  .object({
    metresPerPixel: z
      .number({ error: "Scale must be a number of metres per pixel" })
      .gt(0, { error: "Scale must be more than zero" })
      .max(10, { error: "Scale must be at most 10 m per pixel" }),
    offsetX: planCoord("Offset x"),
    offsetY: planCoord("Offset y"),
    rotationDeg: z.number({ error: "Rotation must be a number of degrees" }).min(-360).max(360),
    opacity: z
      .number({ error: "Opacity must be a number from 0 to 1" })
      .min(0, { error: "Opacity must be from 0 to 1" })
      .max(1, { error: "Opacity must be from 0 to 1" }),
    locked: z.boolean({ error: "Locked must be true or false" }),
  })
  .partial()
  .extend({ version: versionSchema })
  .strict();

export const UPLOAD_KINDS = ["underlay", "import"] as const;
