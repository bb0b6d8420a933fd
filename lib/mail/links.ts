import "server-only";
import { headers } from "next/headers";

/**
 * The address people open links in mail at: APP_URL when the deployment sets it, otherwise the host the
 * request came in on (the address the sender was using themselves).
 */
export async function appOrigin(): Promise<string> {
  const configured = process.env.APP_URL;
  if (configured) return configured.replace(/\/+$/, "");
  const h = await headers();
  const host = h.get("x-forwarded-host") ?? h.get("host") ?? "127.0.0.1:3000";
  const proto = h.get("x-forwarded-proto") ?? "http";
  return `${proto}://${host}`;
}
