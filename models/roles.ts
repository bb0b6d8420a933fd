/** The four roles a member of a production can hold; the memberships table's enum is built from this list. */
export const ROLES = ["designer", "electrician", "stage_manager", "viewer"] as const;
export type Role = (typeof ROLES)[number];
