import { collectionRoutes } from "@/lib/http/crud-routes";
import { getTeam } from "@/lib/data/team";

// Every member sees who is on the team; managing it is the owner's (team/[memberId], invitations).
export const { GET } = collectionRoutes({ key: "members", itemKey: "member", list: getTeam });
