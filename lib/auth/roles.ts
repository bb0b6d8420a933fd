import type { Role } from "@/models/roles";

// The list lives with the models (the database's enum is built from it); this module adds labels and landings.
export { ROLES, type Role } from "@/models/roles";

export const ROLE_LABELS: Record<Role, string> = {
  designer: "Lighting designer",
  electrician: "Electrician",
  stage_manager: "Stage manager",
  viewer: "Viewer",
};

/** Where a member lands when they open a production. */
export const LANDING_TAB: Record<Role, string> = {
  designer: "",
  electrician: "",
  stage_manager: "cues",
  viewer: "",
};
