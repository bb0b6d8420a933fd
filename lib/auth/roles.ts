/** The four roles a member of a production can hold. */
export const ROLES = ["designer", "electrician", "stage_manager", "viewer"] as const;
export type Role = (typeof ROLES)[number];

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
