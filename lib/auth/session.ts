import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { getIronSession, type SessionOptions } from "iron-session";
import { env } from "@/lib/env";

export type SessionData = { userId?: number; name?: string; email?: string };

export const SESSION_COOKIE = "throwline_session";

async function options(): Promise<SessionOptions> {
  // Secure only over HTTPS (behind a proxy that says so), so plain-HTTP local use still works.
  const h = await headers();
  const https = h.get("x-forwarded-proto") === "https";
  return {
    password: env().SESSION_SECRET,
    cookieName: SESSION_COOKIE,
    ttl: 60 * 60 * 24 * 14,
    cookieOptions: { httpOnly: true, sameSite: "lax", secure: https, path: "/" },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), await options());
}

/** The signed-in user's id and name, or null. Cached per request. */
export const getCurrentUser = cache(async () => {
  const session = await getSession();
  if (!session.userId) return null;
  return { id: session.userId, name: session.name ?? "", email: session.email ?? "" };
});
