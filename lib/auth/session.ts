import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { getIronSession, type SessionOptions } from "iron-session";
import { env } from "@/lib/env";
import { getSessionUser } from "@/lib/data/sessions";

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

/** The signed-in user (read fresh from the database), or null. Cached per request. */
export const getCurrentUser = cache(async () => {
  const session = await getSession();
  if (!session.token) return null;
  return getSessionUser(session.token);
});
