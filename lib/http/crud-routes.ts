import "server-only";
import type { z } from "zod";
import { requireFields, requireMember, requireSomeField } from "@/lib/auth/guards";
import type { Entity, Permission } from "@/lib/auth/policy";
import { notFound } from "@/lib/errors";
import { parseBody, parseId, readJson, readJsonValue, readQuery, route } from "./respond";
import { stampedJson } from "./stamped-json";

/**
 * Route handlers for a production-owned entity from one declaration, the HTTP side of
 * `productionCrud` (lib/data/production-crud.ts). Every handler checks membership and role first
 * (outsiders 404, members without the right 403), then the id (plain digits only, else 404), then
 * the body (400 naming each field), and only then calls the data layer.
 *
 *   // app/api/productions/[productionId]/focus-points/route.ts
 *   export const { GET, POST } = collectionRoutes({
 *     key: "focusPoints", itemKey: "focusPoint",
 *     list: getFocusPointsByProduction,
 *     create: { permission: "plot.edit", schema: createFocusPointSchema, run: createFocusPoint },
 *   });
 *
 *   // app/api/productions/[productionId]/focus-points/[focusPointId]/route.ts
 *   export const { PATCH, DELETE } = itemRoutes({
 *     key: "focusPoint",
 *     update: { permission: "plot.edit", schema: updateFocusPointSchema, run: updateFocusPoint },
 *     remove: { permission: "plot.edit", run: deleteFocusPoint },
 *   });
 *
 * The row is sent under `key` ({ focusPoint: … }) and its id is read from the folder `[focusPointId]`
 * (key + "Id"); a 404 says "Focus point was not found." unless `what` names it otherwise.
 *
 * Only the methods given are returned (the types say which), so exporting one that was not
 * declared fails the typecheck. Reads need only membership; writes need `permission`, or, with
 * `fields: "cue"` on an update, each written field's own right from the role table
 * (lib/auth/policy.ts), refused with a 403 whose fieldErrors name the fields. The id reaches the
 * data layer as `id` and under the folder's name (`cueId`), so either kind of data function fits.
 */

type Ctx = { params: Promise<Record<string, string>> };
type Handler = (req: Request, ctx: Ctx) => Promise<Response>;
type Who = { productionId: number; userId: number };
/** The row's id goes to the data layer both as `id` and under the URL's own name (`cueId`). */
type Target<P extends string> = { productionId: number; id: number } & Record<P, number>;
/** A write needs one right of the role table, or, with `fields`, each written field's own right. */
type WriteRight = { permission: Permission; fields?: never } | { fields: Entity; permission?: never };

export type ItemRouteSpec<K extends string, S extends z.ZodType, Q extends z.ZodType, G, U, R> = {
  /** The key the row is sent under ({ focusPoint: … }); the id's folder is `[${key}Id]`. */
  key: K;
  /** What a user calls one, capitalised, for "… was not found."; by default the key in words ("Focus point"). */
  what?: string;
  /** GET (members): one row, or null for a 404. */
  get?: (args: Target<`${K}Id`>) => Promise<G | null>;
  /** PATCH: a JSON body read with `schema`, a 400 naming each bad field, before any write. */
  update?: WriteRight & { schema: S; run: (args: Who & Target<`${K}Id`> & { patch: z.output<S> }) => Promise<U> };
  /** DELETE: with `query`, the query string is read with it (e.g. the version the user last saw). */
  remove?: {
    permission: Permission;
    query?: Q;
    run: (args: Who & Target<`${K}Id`> & { query: z.output<Q> }) => Promise<R>;
  };
};

type Given<T, Method extends string> = [T] extends [never] ? unknown : { [M in Method]: Handler };

/** "fixtureType" → "Fixture type". */
export function inWords(key: string): string {
  const words = key.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export function itemRoutes<
  K extends string,
  S extends z.ZodType = never,
  Q extends z.ZodType = never,
  G = never,
  U = never,
  R = never,
>(spec: ItemRouteSpec<K, S, Q, G, U, R>): Given<G, "GET"> & Given<U, "PATCH"> & Given<R, "DELETE"> {
  const param = `${spec.key}Id` as const;
  const what = spec.what ?? inWords(spec.key);
  async function target(ctx: Ctx, permission: Permission) {
    const params = await ctx.params;
    const { user, member, productionId } = await requireMember(params.productionId, permission);
    if (!(param in params))
      throw new Error(`itemRoutes({ key: "${spec.key}" }) needs its route in a folder named [${param}]`);
    const id = parseId(params[param], what);
    return { user, member, target: { productionId, id, [param]: id } as Target<`${K}Id`> };
  }
  const handlers: Partial<Record<"GET" | "PATCH" | "DELETE", Handler>> = {};
  const { get, update, remove } = spec;
  if (get) {
    handlers.GET = route(async (_req, ctx: Ctx) => {
      const row = await get((await target(ctx, "production.view")).target);
      if (row === null || row === undefined) throw notFound(what);
      return { [spec.key]: row };
    });
  }
  if (update) {
    handlers.PATCH = route(async (req, ctx: Ctx) => {
      const { user, member, target: t } = await target(ctx, update.permission ?? "production.view");
      const body = await readJsonValue(req);
      if (update.fields) requireSomeField(member, update.fields, body);
      const patch = parseBody(update.schema, body);
      if (update.fields) requireFields(member, update.fields, patch as object);
      return { [spec.key]: await update.run({ ...t, userId: user.id, patch }) };
    });
  }
  if (remove) {
    handlers.DELETE = route(async (req, ctx: Ctx) => {
      const { user, target: t } = await target(ctx, remove.permission);
      const query = (remove.query ? readQuery(req, remove.query) : undefined) as z.output<Q>;
      await remove.run({ ...t, userId: user.id, query });
      return { ok: true };
    });
  }
  return handlers as Given<G, "GET"> & Given<U, "PATCH"> & Given<R, "DELETE">;
}

export type CollectionRouteSpec<S extends z.ZodType, I, L, C> = {
  /** The key the list is sent under: { focusPoints: [...] }. */
  key: string;
  /** The key a created row is sent under: { focusPoint: … }. */
  itemKey: string;
  /** GET (members): every row of the production, in the entity's order. */
  list?: (args: { productionId: number }) => Promise<L>;
  /**
   * For a list that is costly to build: a fingerprint of what it is built from. The list is then built
   * once per fingerprint and answered with an ETag (lib/http/stamped-json.ts).
   */
  stamp?: (productionId: number) => Promise<string>;
  /**
   * POST (201): a JSON body read with `schema`, or, for a body that is not JSON (a file upload), the
   * input `read` returns; either way the whole input is checked before `run` writes anything.
   */
  create?: ({ schema: S; read?: never } | { read: (req: Request) => Promise<I>; schema?: never }) & {
    permission: Permission;
    run: (args: Who & { input: [S] extends [never] ? I : z.output<S> }) => Promise<C>;
  };
};

export function collectionRoutes<S extends z.ZodType = never, I = never, L = never, C = never>(
  spec: CollectionRouteSpec<S, I, L, C>,
): Given<L, "GET"> & Given<C, "POST"> {
  const handlers: Partial<Record<"GET" | "POST", Handler>> = {};
  const { list, create, stamp } = spec;
  if (list) {
    handlers.GET = route(async (req, ctx: Ctx) => {
      const { productionId } = await requireMember((await ctx.params).productionId);
      const build = async () => ({ [spec.key]: await list({ productionId }) });
      if (!stamp) return build();
      return stampedJson(req, { key: `${spec.key}:${productionId}`, stamp: await stamp(productionId), build });
    });
  }
  if (create) {
    handlers.POST = route(async (req, ctx: Ctx) => {
      const { productionId, user } = await requireMember((await ctx.params).productionId, create.permission);
      const input = create.read ? await create.read(req) : await readJson(req, create.schema);
      const row = await create.run({ productionId, userId: user.id, input: input as never });
      return Response.json({ [spec.itemKey]: row }, { status: 201 });
    });
  }
  return handlers as Given<L, "GET"> & Given<C, "POST">;
}
