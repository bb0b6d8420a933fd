import { AppError } from "@/lib/errors";

/** A unique index refused the write: Sequelize's wrapper, or the driver's own error (1062) on a plain statement. */
export function isDuplicateKey(err: unknown): boolean {
  const e = err as { name?: string; errno?: number; code?: string };
  return e?.name === "SequelizeUniqueConstraintError" || e?.errno === 1062 || e?.code === "ER_DUP_ENTRY";
}

/** Turns a duplicate-name violation into a 400 on the `name` field; rethrows anything else. */
export function uniqueNameError(what: string) {
  return (err: unknown): never => {
    if (isDuplicateKey(err)) {
      throw new AppError(
        "bad_request",
        `This production already has ${/^[aeiou]/i.test(what) ? "an" : "a"} ${what} with that name.`,
        { fieldErrors: { name: ["already used"] } },
      );
    }
    throw err;
  };
}
