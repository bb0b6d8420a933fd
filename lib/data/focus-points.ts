import "server-only";
import { literal } from "sequelize";
import { getDb, type FocusPoint } from "@/models";
import type { z } from "zod";
import type { createFocusPointSchema, updateFocusPointSchema } from "@/lib/validation/rig";
import type { FocusPointDto } from "@/lib/dto/plan";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";
import { recordChange } from "./changes";
import { toFixtureRecord } from "./fixtures";

export const toFocusPointDto = (p: FocusPoint): FocusPointDto =>
  plain(p, ["id", "productionId", "name", "x", "y", "version", "updatedAt"]);

const focusPoints = productionCrud<
  FocusPoint,
  FocusPointDto,
  z.infer<typeof createFocusPointSchema>,
  z.infer<typeof updateFocusPointSchema>
>({
  model: () => getDb().FocusPoint,
  entity: "focusPoint",
  what: "Focus point",
  toDto: toFocusPointDto,
  order: [["name", "ASC"]],
  // Fixtures aimed at a deleted point keep their mark where the point was.
  // Each such fixture's history records the change of its mark.
  beforeDelete: async (row, { productionId, userId, transaction }) => {
    const { Fixture } = getDb();
    const where = { productionId, focusPointId: row.id };
    const aimed = await Fixture.findAll({ where, order: [["id", "ASC"]], lock: true, transaction });
    await Fixture.update(
      { focusX: row.x, focusY: row.y, focusPointId: null, version: literal("version + 1") as never },
      { where, transaction },
    );
    for (const f of aimed) {
      const before = toFixtureRecord(f);
      const after = { ...before, focusX: row.x, focusY: row.y, focusPointId: null, version: before.version + 1 };
      await recordChange(
        { productionId, userId, entity: "fixture", entityId: f.id, action: "update", before, after },
        transaction,
      );
    }
  },
});

export const getFocusPointsByProduction = focusPoints.list;
export const createFocusPoint = focusPoints.create;
/** Moving a focus point moves the mark of every fixture aimed at it (they reference it, not a copy). */
export const updateFocusPoint = focusPoints.update;
export const deleteFocusPoint = focusPoints.remove;
