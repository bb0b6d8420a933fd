import { route, readJson, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { forbiddenFields } from "@/lib/auth/policy";
import { AppError, notFound } from "@/lib/errors";
import { deleteCue, getCueById, updateCue } from "@/lib/data/cues";
import { cuePatchSchema } from "@/lib/validation/cue";
import { idSchema } from "@/lib/validation/common";
import { z } from "zod";

type Ctx = { params: Promise<{ productionId: string; cueId: string }> };

async function ids(params: Ctx["params"]) {
  const p = await params;
  const cueId = idSchema.safeParse(p.cueId);
  if (!cueId.success) throw notFound("Cue");
  return { rawProductionId: p.productionId, cueId: cueId.data };
}

export const GET = route(async (_req, { params }: Ctx) => {
  const { rawProductionId, cueId } = await ids(params);
  const { productionId } = await requireMember(rawProductionId);
  return { cue: await getCueById({ productionId, cueId }) };
});

/** Fields are checked one by one against the role table: the stage manager may write page and call note only. */
export const PATCH = route(async (req, { params }: Ctx) => {
  const { rawProductionId, cueId } = await ids(params);
  const { productionId, member, user } = await requireMember(rawProductionId);
  const patch = await readJson(req, cuePatchSchema);
  const denied = forbiddenFields(member, "cue", Object.keys(patch).filter((k) => k !== "version"));
  if (denied.length) {
    throw new AppError("forbidden", `Your role cannot change: ${denied.join(", ")}.`, { fieldErrors: Object.fromEntries(denied.map((f) => [f, ["not editable by your role"]])) });
  }
  return { cue: await updateCue({ productionId, cueId, patch, userId: user.id }) };
});

const deleteQuery = z.object({ version: z.coerce.number({ error: "version is required (the version you last read)" }).int().positive() });

export const DELETE = route(async (req, { params }: Ctx) => {
  const { rawProductionId, cueId } = await ids(params);
  const { productionId, user } = await requireMember(rawProductionId, "cues.edit");
  const { version } = readQuery(req, deleteQuery);
  await deleteCue({ productionId, cueId, version, userId: user.id });
  return { ok: true };
});
