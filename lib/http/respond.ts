import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { AppError, fromZodError, toAppError } from "@/lib/errors";
import { BodyTooLarge, readBoundedBody } from "@/lib/io/bounded-body";
import { toId } from "./id";
import { REFUSAL_CODES, refuseCrossSiteWrite } from "./request-guard";

/**
 * A write another site could have sent (a foreign Origin or Sec-Fetch-Site), a body a plain HTML form can
 * send (text/plain, urlencoded) or a declared length past the cap is refused before the handler runs.
 * The proxy applies the same rule to pages; the API applies it here (see lib/http/request-guard.ts).
 */
export function refuseForeignWrite(req: Request): void {
  const url = new URL(req.url);
  const refusal = refuseCrossSiteWrite(
    { method: req.method, pathname: url.pathname, headers: req.headers },
    url.protocol.replace(":", ""),
  );
  if (refusal) throw new AppError(REFUSAL_CODES[refusal.status], refusal.message);
}

/**
 * Wraps a route handler: cross-site writes are refused first, its result becomes JSON, its errors a JSON
 * error with the right status. Every API route goes through here (a test sweeps the route tree).
 */
export function route<Ctx>(fn: (req: Request, ctx: Ctx) => Promise<unknown>) {
  return async (req: Request, ctx: Ctx): Promise<Response> => {
    try {
      refuseForeignWrite(req);
      const result = await fn(req, ctx);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (err) {
      const appError = toAppError(err);
      const retry = appError.details.retryAfterSeconds;
      return NextResponse.json(appError.toJSON(), {
        status: appError.status,
        headers: retry ? { "Retry-After": String(retry) } : undefined,
      });
    }
  };
}

/** The largest JSON body any route reads: the biggest real one (a bulk edit of a large rig) is well under. */
export const MAX_JSON_BYTES = 1024 * 1024;

/** Reads and validates a JSON body; a body that is not JSON is a 400 that says so. */
export async function readJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.infer<S>> {
  return parseBody(schema, await readJsonValue(req));
}

/**
 * The JSON body, not yet validated (for checks that must come before the schema's, such as field
 * rights). The bytes are counted as they arrive, so an oversized body (chunked, or lying about its
 * length) is refused at the cap.
 */
export async function readJsonValue(req: Request): Promise<unknown> {
  let bytes: Uint8Array;
  try {
    bytes = await readBoundedBody(req, MAX_JSON_BYTES);
  } catch (err) {
    if (err instanceof BodyTooLarge)
      throw new AppError(
        "too_large",
        `The request body is over ${MAX_JSON_BYTES / 1024} KB, more than any change needs.`,
      );
    throw err;
  }
  try {
    return JSON.parse(new TextDecoder().decode(bytes));
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.", {
      fieldErrors: { "(body)": ["not valid JSON"] },
    });
  }
}

/** Validates a body read with readJsonValue: a 400 naming each field. */
export function parseBody<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw fromZodError(parsed.error);
  return parsed.data;
}

export function readQuery<S extends z.ZodType>(req: Request, schema: S): z.infer<S> {
  const params = Object.fromEntries(new URL(req.url).searchParams.entries());
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw fromZodError(parsed.error);
  return parsed.data;
}

/** Parses an id from a URL segment (see lib/http/id.ts); anything else is simply not found. */
export function parseId(raw: string, what: string): number {
  const id = toId(raw);
  if (id === null) throw new AppError("not_found", `${what} was not found.`);
  return id;
}
