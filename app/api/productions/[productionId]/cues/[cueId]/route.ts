import { z } from "zod";
import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteCue, getCueById, updateCue } from "@/lib/data/cues";
import { cuePatchSchema } from "@/lib/validation/cue";
import { plainCountText } from "@/lib/http/id";

const deleteQuery = z.object({ version: plainCountText("version is required (the version you last read)") });

/** Cue fields are checked one by one against the role table: the stage manager may write page and call note only. */
export const { GET, PATCH, DELETE } = itemRoutes({
  key: "cue",
  get: getCueById,
  update: { fields: "cue", schema: cuePatchSchema, run: updateCue },
  remove: {
    permission: "cues.edit",
    query: deleteQuery,
    run: ({ query, ...cue }) => deleteCue({ ...cue, version: query.version }),
  },
});
