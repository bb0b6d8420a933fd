import "server-only";
import { notFound, redirect } from "next/navigation";
import { AppError } from "@/lib/errors";
import { requireMember, requireUser, type MemberContext } from "./guards";
import type { Permission } from "./policy";

/** For pages: the signed-in user, or a redirect to sign-in. */
export async function userForPage() {
  try {
    return await requireUser();
  } catch {
    redirect("/sign-in");
  }
}

/** For pages: the member context, a redirect to sign-in, or the not-found page (outsiders and bad ids). */
export async function memberForPage(rawProductionId: string, permission?: Permission): Promise<MemberContext> {
  let outcome: MemberContext | "sign-in" | "not-found";
  try {
    outcome = await requireMember(rawProductionId, permission);
  } catch (err) {
    if (!(err instanceof AppError)) throw err;
    outcome = err.code === "unauthorized" ? "sign-in" : "not-found";
  }
  if (outcome === "sign-in") redirect("/sign-in");
  if (outcome === "not-found") notFound();
  return outcome;
}
