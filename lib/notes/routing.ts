// Who a show report's lighting item goes to when the stage manager names nobody: the role that does that
// kind of job (the crew for work, focus and paperwork; the designer for cues).
import type { Role } from "@/models/roles";
import type { NoteKind } from "@/models/note-vocabulary";

const OWNER_ROLE: Record<NoteKind, Role | null> = {
  work: "electrician",
  focus: "electrician",
  paperwork: "electrician",
  cue: "designer",
  general: null,
};

/** The first member (in the team's order) holding the role that does this kind of job; null when none. */
export function defaultOwner(kind: NoteKind, team: Array<{ userId: number; role: Role }>): number | null {
  const role = OWNER_ROLE[kind];
  return role ? (team.find((m) => m.role === role)?.userId ?? null) : null;
}
