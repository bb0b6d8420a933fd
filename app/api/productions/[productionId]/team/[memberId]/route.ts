import { itemRoutes } from "@/lib/http/crud-routes";
import { changeMemberRole, removeMember } from "@/lib/data/team";
import { changeRoleSchema } from "@/lib/validation/team";

// A member is addressed by their user id. Role changes and removal are the owner's (team.manage).
export const { PATCH, DELETE } = itemRoutes({
  key: "member",
  what: "That team member",
  update: { permission: "team.manage", schema: changeRoleSchema, run: changeMemberRole },
  remove: { permission: "team.manage", run: removeMember },
});
