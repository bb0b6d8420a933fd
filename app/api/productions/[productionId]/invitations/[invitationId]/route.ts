import { itemRoutes } from "@/lib/http/crud-routes";
import { withdrawInvitation } from "@/lib/data/invitations";

/** Withdraws an open invitation (owner); its link then opens a "withdrawn" page. */
export const { DELETE } = itemRoutes({
  key: "invitation",
  remove: { permission: "team.manage", run: withdrawInvitation },
});
