import { collectionRoutes } from "@/lib/http/crud-routes";
import { createNote, getNotesByProduction } from "@/lib/data/notes";
import { createNoteSchema } from "@/lib/notes/schemas";

// Any member may write a note; the current cue and the author are filled in by the server.
export const { GET, POST } = collectionRoutes({
  key: "notes",
  itemKey: "note",
  list: getNotesByProduction,
  create: { permission: "notes.write", schema: createNoteSchema, run: createNote },
});
