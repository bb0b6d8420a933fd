import "server-only";
// Fixture types added in a batch, from the starter shelf or another production: one transaction, names
// the production already has skipped (letter case aside), so a second click or a second tab adds nothing twice.
import type { z } from "zod";
import { getDb } from "@/models";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { createFixtureTypeSchema, fixtureTypeFieldsSchema } from "@/lib/validation/rig";
import { recordChange } from "./changes";
import { toFixtureTypeDto } from "./fixture-types";
import { inTransaction } from "./transaction";

export type TypeInput = z.infer<typeof createFixtureTypeSchema>;
export type AddedTypes = { added: FixtureTypeDto[]; skipped: string[] };

const key = (name: string) => name.trim().toLowerCase();

export async function addFixtureTypes({
  productionId,
  userId,
  types,
}: {
  productionId: number;
  userId: number;
  types: TypeInput[];
}): Promise<AddedTypes> {
  const { Production, FixtureType } = getDb();
  return inTransaction(async (transaction) => {
    // The production row's lock queues two batches for one production, so both cannot add the same name.
    await Production.findByPk(productionId, { transaction, lock: true, attributes: ["id"] });
    const existing = await FixtureType.findAll({ where: { productionId }, attributes: ["name"], transaction });
    const taken = new Set(existing.map((t) => key(t.name)));
    const added: FixtureTypeDto[] = [];
    const skipped: string[] = [];
    for (const input of types) {
      if (taken.has(key(input.name))) {
        skipped.push(input.name);
        continue;
      }
      taken.add(key(input.name));
      const row = await FixtureType.create({ frameSize: null, goboSize: null, ...input, productionId } as never, {
        transaction,
      });
      const dto = toFixtureTypeDto(row);
      await recordChange(
        { productionId, userId, entity: "fixtureType", entityId: row.id, action: "create", after: dto },
        transaction,
      );
      added.push(dto);
    }
    return { added, skipped };
  });
}

const FIELDS = Object.entries(fixtureTypeFieldsSchema.shape) as Array<[keyof FixtureTypeDto, z.ZodType]>;

/**
 * A type of another production as the input that creates the same type here (its figures, not its
 * identity). A stored value the field's check no longer takes (an empty optional figure, say) is left
 * to this production's default rather than refusing the copy.
 */
export function typeInputOf(t: FixtureTypeDto): TypeInput {
  const picked = Object.fromEntries(
    FIELDS.filter(([f, schema]) => t[f] !== undefined && schema.safeParse(t[f]).success).map(([f]) => [f, t[f]]),
  );
  return createFixtureTypeSchema.parse(picked);
}
