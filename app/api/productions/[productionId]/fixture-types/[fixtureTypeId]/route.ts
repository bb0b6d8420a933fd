import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { forbiddenFields } from "@/lib/auth/policy";
import { AppError } from "@/lib/errors";
import { deleteFixtureType, updateFixtureType } from "@/lib/data/fixture-types";
import { updateFixtureTypeSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string; fixtureTypeId: string }> };

export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user, member } = await requireMember(p.productionId);
  const patch = await readJson(req, updateFixtureTypeSchema);
  const denied = forbiddenFields(member, "fixtureType", Object.keys(patch).filter((k) => k !== "version"));
  if (denied.length) throw new AppError("forbidden", `Your role cannot change: ${denied.join(", ")}.`);
  return { fixtureType: await updateFixtureType({ productionId, id: parseId(p.fixtureTypeId, "Fixture type"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deleteFixtureType({ productionId, id: parseId(p.fixtureTypeId, "Fixture type"), userId: user.id });
  return { ok: true };
});
