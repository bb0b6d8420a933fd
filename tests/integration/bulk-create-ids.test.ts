// The ids of rows made by one multi-row INSERT when the server steps auto-increment by more than 1, as a
// Galera cluster does (it sets auto_increment_increment to the number of nodes). Sequelize's own
// bulkCreate numbers the rows 1 apart, which sent cue levels to the wrong cues (a foreign-key failure)
// on the three-node cluster of `npm run test:cluster`. Run here in-process against the suite's MariaDB,
// with the step set for one session, so that `npm test` keeps the rule without a cluster.
import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { getDb } from "@/models";
import { bulkCreateWithIds } from "@/lib/data/bulk-create";

describe("bulkCreateWithIds", () => {
  afterAll(() => getDb().sequelize.close());

  for (const step of [1, 3]) {
    it(`gives each new row the id the server gave it, with auto_increment_increment = ${step}`, async () => {
      const { sequelize, Production, Position } = getDb();
      const t = await sequelize.transaction();
      try {
        await sequelize.query(`SET SESSION auto_increment_increment = ${step}`, { transaction: t });
        const production = await Production.create({ name: "Id step check" } as never, { transaction: t });
        const names = ["Pipe A", "Pipe B", "Pipe C", "Pipe D"];
        const made = await bulkCreateWithIds(
          Position,
          names.map((name, i) => ({
            productionId: production.id,
            name,
            kind: "overhead-pipe",
            x1: -5,
            y1: i,
            x2: 5,
            y2: i,
            trimHeight: 6,
            sortOrder: i,
          })) as never[],
          { transaction: t },
        );
        const stored = await sequelize.query<{ id: number; name: string }>(
          "SELECT id, name FROM positions WHERE production_id = ? ORDER BY id",
          { replacements: [production.id], type: QueryTypes.SELECT, transaction: t },
        );
        // What the server stored is the reference: every returned row names its own stored id.
        expect(made.map((p) => [p.id, p.name])).toEqual(stored.map((r) => [Number(r.id), r.name]));
        expect(Number(stored[1].id) - Number(stored[0].id)).toBe(step);
      } finally {
        await sequelize.query("SET SESSION auto_increment_increment = 1", { transaction: t });
        await t.rollback();
      }
    });
  }
});
