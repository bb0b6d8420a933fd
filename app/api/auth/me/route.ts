import { route } from "@/lib/http/respond";
import { requireUser } from "@/lib/auth/guards";

export const GET = route(async () => ({ user: await requireUser() }));
