// The rights the role table (lib/auth/policy.ts) hands out, in a file of their own so the fixture field
// registry can name the right each field needs without importing the policy that reads the registry.

export const PERMISSIONS = [
  "production.view",
  "settings.edit",
  "plot.edit", // positions, focus points, acting areas, the designer's fixture fields
  "rig.editElectrics", // circuit, dimmer, DMX, accessories, type swaps, hung/focused, as-focused notes
  "rig.import",
  "rig.export",
  "cues.edit", // numbers, levels, times, follows, labels
  "cues.editCallNotes", // page and call note
  "studies.view",
  "studies.run", // studies and checks
  "revisions.issue", // issue a revision, e-mail the team
  "team.manage",
  "production.archive", // put away and restore (the owner's)
  "production.delete", // delete with everything in it (the owner's)
  "notes.write", // write a note, change an open one (any member)
  "notes.setCurrentCue", // the "current cue" new notes pick up (stage manager, board operator)
  "notes.closeWork", // mark a work note done or cannot-do, or reopen it
  "notes.closeFocus",
  "notes.closeCue",
  "notes.closePaperwork",
  "notes.closeGeneral",
  "notes.fileShowReport", // the stage manager's report after a performance
] as const;
export type Permission = (typeof PERMISSIONS)[number];
