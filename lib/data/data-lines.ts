import "server-only";
import type { z } from "zod";
import { Op, type Transaction } from "sequelize";
import { getDb, type DataLine } from "@/models";
import type { DataLineDto } from "@/lib/dto/checks";
import type { createDataLineSchema, updateDataLineSchema } from "@/lib/validation/checks";
import { AppError } from "@/lib/errors";
import { jsonColumn } from "./json-column";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";
import { inTransaction } from "./transaction";

export const toDataLineDto = (d: DataLine): DataLineDto => ({
  ...plain(d, ["id", "productionId", "name", "universe", "version", "updatedAt"]),
  fixtureIds: jsonColumn<number[]>(d.fixtureIds) ?? [],
});

/** Every unit on a line must be a fixture of this production, and appear once. */
async function checkUnits(fixtureIds: number[], productionId: number, transaction: Transaction) {
  const twice = fixtureIds.find((id, i) => fixtureIds.indexOf(id) !== i);
  if (twice != null)
    throw new AppError("bad_request", `Fixture ${twice} is on the data line twice.`, {
      fieldErrors: { fixtureIds: ["a unit appears twice"] },
    });
  if (!fixtureIds.length) return;
  const found = await getDb().Fixture.count({ where: { productionId, id: { [Op.in]: fixtureIds } }, transaction });
  if (found !== fixtureIds.length)
    throw new AppError("bad_request", "Some units on the data line are not fixtures of this production.", {
      fieldErrors: { fixtureIds: ["unknown fixture"] },
    });
}

type Create = z.infer<typeof createDataLineSchema>;
type Update = z.infer<typeof updateDataLineSchema>;

const lines = productionCrud<DataLine, DataLineDto, Create, Update>({
  model: () => getDb().DataLine,
  entity: "dataLine",
  what: "Data line",
  toDto: toDataLineDto,
  order: [["name", "ASC"]],
  prepareCreate: async (input, { productionId, transaction }) => {
    await checkUnits(input.fixtureIds ?? [], productionId, transaction);
    return { universe: null, fixtureIds: [], ...input };
  },
});

export const getDataLinesByProduction = lines.list;
export const createDataLine = lines.create;
export const deleteDataLine = lines.remove;

export async function updateDataLine(args: {
  productionId: number;
  id: number;
  userId: number;
  patch: Update;
}): Promise<DataLineDto> {
  if (args.patch.fixtureIds) {
    const ids = args.patch.fixtureIds;
    await inTransaction((transaction) => checkUnits(ids, args.productionId, transaction));
  }
  return lines.update(args);
}
