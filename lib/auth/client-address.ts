import "server-only";
import { headers } from "next/headers";

/**
 * The address a request came from, for the per-address limits. Next's server sets X-Forwarded-For to the
 * peer's address when the request carries none; behind a load balancer, the client's entry is the first.
 * A client that talks to the app directly can write that header itself, so the per-address limits are
 * only as strong as the proxy in front; the per-account and per-e-mail limits do not depend on it.
 */
export async function clientAddress(): Promise<string> {
  const h = await headers();
  return h.get("x-forwarded-for")?.split(",")[0].trim() || h.get("x-real-ip") || "unknown";
}
