import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteNote, updateNote } from "@/lib/data/notes";
import { updateNoteSchema } from "@/lib/notes/schemas";

// Closing, reopening and deleting follow the note's kind (lib/auth/policy.ts), checked against the stored row.
export const { PATCH, DELETE } = itemRoutes({
  key: "note",
  update: { permission: "notes.write", schema: updateNoteSchema, run: updateNote },
  remove: { permission: "notes.write", run: deleteNote },
});
