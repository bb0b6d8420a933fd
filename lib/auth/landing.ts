import "server-only";
import { getDb } from "@/models";
import { LANDING_TAB } from "./roles";

/** Where a user goes after signing in: straight into their production when they have just one. */
export async function landingPathFor(userId: number): Promise<string> {
  const memberships = await getDb().Membership.findAll({ where: { userId }, limit: 2 });
  if (memberships.length !== 1) return "/productions";
  const [m] = memberships;
  const tab = LANDING_TAB[m.role];
  return `/productions/${m.productionId}${tab ? `/${tab}` : ""}`;
}
