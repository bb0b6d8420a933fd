import { AppError } from "@/lib/errors";

/** Turns a duplicate-name violation into a 400 on the `name` field; rethrows anything else. */
export function uniqueNameError(what: string) {
  return (err: unknown): never => {
    if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
      throw new AppError(
        "bad_request",
        `This production already has ${/^[aeiou]/i.test(what) ? "an" : "a"} ${what} with that name.`,
        { fieldErrors: { name: ["already used"] } },
      );
    }
    throw err;
  };
}
