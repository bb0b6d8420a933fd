import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { getIronSession, type SessionOptions, unsealData } from "iron-session";
import { env } from "@/lib/env";
import { getSessionMember, getSessionUser } from "@/lib/data/sessions";

// The sealed cookie carries a random session token; the session is live only while its record exists
// (lib/data/sessions.ts), so signing out ends it on the server and a replayed cookie is signed out.
export type SessionData = { token?: string };

export const SESSION_COOKIE = "throwline_session";
export const SESSION_TTL_SECONDS = 60 * 60 * 24 * 14;

async function options(): Promise<SessionOptions> {
  // Secure only over HTTPS (behind a proxy that says so), so plain-HTTP local use still works.
  const h = await headers();
  const https = h.get("x-forwarded-proto") === "https";
  return {
    password: env().SESSION_SECRET,
    cookieName: SESSION_COOKIE,
    ttl: SESSION_TTL_SECONDS,
    cookieOptions: { httpOnly: true, sameSite: "lax", secure: https, path: "/" },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), await options());
}

// Unsealing derives keys (PBKDF2) on every call, a visible share of a small read's CPU; the same cookie
// always unseals to the same token, so recent results are kept for a minute. Whether the session is still
// live is asked of the database on every request all the same (sign-out ends it at once).
const UNSEAL_MEMO_MS = 60_000;
const UNSEAL_MEMO_SIZE = 2_000;
const unsealed = new Map<string, { token: string | null; until: number }>();

async function sessionToken(): Promise<string | null> {
  const seal = (await cookies()).get(SESSION_COOKIE)?.value;
  if (!seal) return null;
  const now = Date.now();
  const hit = unsealed.get(seal);
  if (hit && hit.until > now) return hit.token;
  const data = await unsealData<SessionData>(seal, { password: env().SESSION_SECRET, ttl: SESSION_TTL_SECONDS });
  if (unsealed.size >= UNSEAL_MEMO_SIZE) unsealed.clear();
  unsealed.set(seal, { token: data.token ?? null, until: now + UNSEAL_MEMO_MS });
  return data.token ?? null;
}

/** The signed-in user (read fresh from the database), or null. Cached per request. */
export const getCurrentUser = cache(async () => {
  const token = await sessionToken();
  if (!token) return null;
  return getSessionUser(token);
});

/**
 * The signed-in user and their membership of one production, read together (one query), or null when
 * nobody is signed in. Not cached: a route asks once.
 */
export async function getCurrentMember(productionId: number) {
  const token = await sessionToken();
  if (!token) return null;
  return getSessionMember(token, productionId);
}
