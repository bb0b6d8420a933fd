import "server-only";
// The production's colour list for the coverage study: colour text as typed in the rig → transmission %.
import type { z } from "zod";
import { getDb, type ColourTransmission } from "@/models";
import type { createColourTransmissionSchema, updateColourTransmissionSchema } from "@/lib/validation/studies";
import type { ColourTransmissionDto } from "@/lib/dto/studies";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";

export const toColourTransmissionDto = (r: ColourTransmission): ColourTransmissionDto =>
  plain(r, ["id", "productionId", "name", "percent", "version", "updatedAt"]);

const rows = productionCrud<
  ColourTransmission,
  ColourTransmissionDto,
  z.infer<typeof createColourTransmissionSchema>,
  z.infer<typeof updateColourTransmissionSchema>
>({
  model: () => getDb().ColourTransmission,
  entity: "colourTransmission",
  what: "Colour",
  toDto: toColourTransmissionDto,
  order: [["name", "ASC"]],
});

export const getColourTransmissionsByProduction = rows.list;
export const createColourTransmission = rows.create;
export const updateColourTransmission = rows.update;
export const deleteColourTransmission = rows.remove;
