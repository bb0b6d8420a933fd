// A duplicate key is recognised whichever layer reports it: Sequelize's wrapper on a model write, or the
// mariadb driver's own error on a plain statement (lib/data/driver.ts).
import { describe, expect, it } from "vitest";
import { isDuplicateKey, uniqueNameError } from "@/lib/data/unique";
import { AppError } from "@/lib/errors";

// MariaDB error reference: 1062 ER_DUP_ENTRY, "Duplicate entry '%s' for key %d"; 1213 ER_LOCK_DEADLOCK.
const driverDuplicate = Object.assign(new Error("Duplicate entry '4-7-12' for key 'fixtures_unit'"), {
  errno: 1062,
  code: "ER_DUP_ENTRY",
});

describe("isDuplicateKey", () => {
  it("knows Sequelize's wrapper and the driver's error, by number or by code", () => {
    expect(
      isDuplicateKey(Object.assign(new Error("Validation error"), { name: "SequelizeUniqueConstraintError" })),
    ).toBe(true);
    expect(isDuplicateKey(driverDuplicate)).toBe(true);
    expect(isDuplicateKey({ code: "ER_DUP_ENTRY" })).toBe(true);
  });

  it("is false for other database errors and for things that are not errors", () => {
    expect(isDuplicateKey(Object.assign(new Error("Deadlock"), { errno: 1213, code: "ER_LOCK_DEADLOCK" }))).toBe(false);
    expect(isDuplicateKey(new Error("Duplicate entry, said in words only"))).toBe(false);
    expect(isDuplicateKey(null)).toBe(false);
    expect(isDuplicateKey(undefined)).toBe(false);
  });

  it("turns the driver's duplicate into the 400 on the name field, and passes anything else on", () => {
    const toName = uniqueNameError("position");
    let thrown: unknown;
    try {
      toName(driverDuplicate);
    } catch (err) {
      thrown = err;
    }
    expect(thrown).toBeInstanceOf(AppError);
    expect((thrown as AppError).status).toBe(400);
    expect((thrown as AppError).details.fieldErrors).toEqual({ name: ["already used"] });
    expect(() => toName(new Error("other"))).toThrow("other");
  });
});
