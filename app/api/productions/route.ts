import { route, readJson } from "@/lib/http/respond";
import { requireUser } from "@/lib/auth/guards";
import { createProduction, getProductionsByUser } from "@/lib/data/productions";
import { createProductionSchema } from "@/lib/validation/production";

export const GET = route(async () => {
  const user = await requireUser();
  return { productions: await getProductionsByUser({ userId: user.id }) };
});

export const POST = route(async (req) => {
  const user = await requireUser();
  const input = await readJson(req, createProductionSchema);
  const production = await createProduction({ userId: user.id, ...input });
  return Response.json({ production }, { status: 201 });
});
