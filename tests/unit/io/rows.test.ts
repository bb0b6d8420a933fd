import { describe, expect, it } from "vitest";
import { readCsv } from "@/lib/io/csv-read";
import { suggestMapping, normaliseHeader, headerUnit } from "@/lib/io/fields";
import { missingRequiredColumns, validateRows } from "@/lib/io/rows";

function run(csv: string, lengthUnit: "m" | "ft" = "m") {
  const table = readCsv(csv);
  const mapping = suggestMapping(table.headers);
  return { mapping, ...validateRows(table, mapping, { lengthUnit }) };
}

describe("column mapping", () => {
  it("matches headers case-insensitively, with units and our aliases, each field once", () => {
    expect(suggestMapping(["POSITION", "unit #", "X (m)", "Gel", "Throw (m)", "Colour", "Mystery"])).toEqual([
      "position",
      "unitNumber",
      "x",
      "colour",
      "ignore",
      "ignore",
      "ignore",
    ]);
    expect(normaliseHeader("Lens height (ft)")).toBe("lens height");
    expect(headerUnit("Lens height (ft)")).toBe("ft");
  });

  it("prefers the production's remembered choice", () => {
    expect(
      suggestMapping(["Hook", "No."], {
        [normaliseHeader("Hook")]: "position",
        [normaliseHeader("No.")]: "unitNumber",
      }),
    ).toEqual(["position", "unitNumber"]);
  });

  it("names the columns a file must have", () => {
    expect(missingRequiredColumns(["position", "ignore"])).toEqual(["Unit"]);
  });
});

describe("validateRows", () => {
  it("reads feet and inches, numbers as text and decimal commas", () => {
    const { rows, errors } = run("Position;Unit;Lens height;X;Channel\nLX1;7A;10'6\";3,5;0012\n", "m");
    expect(errors).toEqual([]);
    // NIST SP 811: 1 ft = 0.3048 m, 1 in = 0.0254 m → 10'6" = 3.2004 m
    expect(rows[0].values.lensHeight).toBeCloseTo(3.2004, 12);
    expect(rows[0].values.x).toBe(3.5);
    expect(rows[0].values.channel).toBe(12);
  });

  it("reads plain numbers in the chosen unit unless the header names one", () => {
    const { rows } = run("Position,Unit,X,Y (m)\nLX1,1,10,2\n", "ft");
    expect(rows[0].values.x).toBeCloseTo(3.048, 12); // NIST SP 811: 10 ft = 3.048 m
    expect(rows[0].values.y).toBe(2);
  });

  it("reports each bad cell with its row number and the file's column name", () => {
    const { errors, rows } = run("Position,Unit,DMX Address,Hung,Cone\nLX1,1,513,maybe,wide\nLX1,2,1,yes,26\n,3,1,,\n");
    expect(rows).toHaveLength(1);
    expect(errors).toEqual(
      expect.arrayContaining([
        { row: 2, column: "DMX Address", message: "DMX address must be 1–512" }, // ANSI E1.11: slots 1–512
        { row: 2, column: "Hung", message: '"maybe" is not yes or no' },
        expect.objectContaining({ row: 2, column: "Cone" }),
        { row: 4, column: "Position", message: "Position is empty" },
      ]),
    );
  });

  it("refuses the same unit twice in one file, pointing at the first", () => {
    const { errors } = run("Position,Unit\nLX1,7\nlx1,7\n");
    expect(errors).toEqual([{ row: 3, column: "Unit", message: "Unit 7 on lx1 is already in row 2" }]);
  });

  it("undoes the quote that exports put before formula-like text", () => {
    const { rows } = run("Position,Unit,Notes\nLX1,1,'=check frame\n");
    expect(rows[0].values.notes).toBe("=check frame");
  });
});
