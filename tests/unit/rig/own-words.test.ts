// Throwline's demo data and examples use colour words of its own, never a filter maker's catalogue numbers,
// and the demo's dimmers are not simply circuit + 1 (house rules; issue review of our own demo data).
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadDemoTables } from "../focus/demo-production";

const ROOT = process.cwd();
const DIRS = [
  "app",
  "components",
  "hooks",
  "lib",
  "models",
  "seeders",
  "migrations",
  "tests",
  "bench",
  "docs",
  "scripts",
];
const TEXT = /\.(ts|tsx|cjs|mjs|js|md|css|json)$/;

function files(dir: string): string[] {
  const full = path.join(ROOT, dir);
  let out: string[] = [];
  for (const name of readdirSync(full)) {
    const p = path.join(full, name);
    if (statSync(p).isDirectory()) out = out.concat(files(path.join(dir, name)));
    else if (TEXT.test(name)) out.push(path.join(dir, name));
  }
  return out;
}

/**
 * What a maker's catalogue entry looks like when typed into a colour field: one of the letters L, G or E and a
 * three-digit number, R and two or three digits, or a bare hash and a number in the hundreds. Drawing commands
 * in SVG path data (a letter, a number, a space, a number) are not colour fields and are skipped.
 */
const CATALOGUE = /(^|[\s"'`(+,])(?:[LGE]\d{3}|R\d{2,3}|#1\d{2})(?=$|[\s"'`)+,])/;

describe("our own colour words", () => {
  it("no source, demo, UI text, test or benchmark uses a filter maker's catalogue number", () => {
    const hits: string[] = [];
    for (const f of DIRS.flatMap((d) => files(d))) {
      if (f.endsWith("own-words.test.ts")) continue;
      readFileSync(path.join(ROOT, f), "utf8")
        .split("\n")
        .forEach((line, i) => {
          if (/\bd="|path d=|points="|viewBox/.test(line)) return;
          if (CATALOGUE.test(line)) hits.push(`${f}:${i + 1}: ${line.trim().slice(0, 100)}`);
        });
    }
    expect(hits).toEqual([]);
  });

  it("the pattern catches the kinds of entry it is meant to catch", () => {
    // Shapes built from invented digits at run time, so this file holds no catalogue-like text itself.
    const code = (letter: string, digits: number, width = 3) => letter + String(digits).padStart(width, "0");
    const shapes = [
      `colour: "${code("L", 987)}"`,
      `${code("G", 654)} + #${198}`,
      `${code("R", 9, 2)}+${code("E", 876)}`,
      `colour: "${code("R", 97, 2)}"`,
    ];
    for (const s of shapes) expect(CATALOGUE.test(s), s).toBe(true);
    for (const s of ['colour: "full CTB + light frost"', "M6 7 L13 25", "Profile 26", "DMX 512"])
      expect(CATALOGUE.test(s), s).toBe(false);
  });
});

describe("the demo rig's dimmers", () => {
  it("are not numbered circuit + 1", async () => {
    const t = await loadDemoTables();
    const dimmed = t.fixtures.filter((f) => f.dimmer != null);
    expect(dimmed.length).toBeGreaterThan(50);
    const offByOne = dimmed.filter((f) => Number(f.dimmer) === Number(f.circuit) + 1);
    expect(offByOne).toEqual([]);
    // Each dimmer feeds one unit in the demo.
    expect(new Set(dimmed.map((f) => f.dimmer)).size).toBe(dimmed.length);
  });
});
