import { describe, expect, it } from "vitest";
import { checkPower, effectiveElectrical, loadKindOfType } from "@/lib/checks";
import { parseTypeCell, TYPE_COLUMNS } from "@/lib/rig/type-fields";
import { unit } from "./fixtures";

const nec = effectiveElectrical({ electricalCode: "us-nec", supplySystem: "120-208-3ph", voltage: 0, derating: null });
const dimmed = { id: 1, name: "22", ratingA: 20, phase: "A", dimmed: true };

describe("lamp or switch-mode: the type's load field, then its family, never its DMX footprint", () => {
  it("an LED family is switch-mode with one slot or many; other families are lamps unless the type says", () => {
    // common practice, no source: an LED unit has an electronic driver whatever its DMX mode takes
    expect(loadKindOfType({ family: "led-wash", loadKind: null })).toEqual({ kind: "switch-mode", source: "family" });
    expect(loadKindOfType({ family: "profile", loadKind: null })).toEqual({ kind: "lamp", source: "family" });
    // an LED profile filed under "profile": its type says so
    expect(loadKindOfType({ family: "profile", loadKind: "switch-mode" })).toEqual({
      kind: "switch-mode",
      source: "set",
    });
    // and a type can say lamp whatever its family
    expect(loadKindOfType({ family: "led-wash", loadKind: "lamp" })).toEqual({ kind: "lamp", source: "set" });
  });

  it("a single-slot LED unit on a dimmed circuit is an error, not a lamp load", () => {
    const load = loadKindOfType({ family: "led-wash", loadKind: null });
    const led = unit({ id: 31, circuit: "22", wattage: 180, footprint: 1, dmxMode: "dimmer", loadKind: load.kind });
    const r = checkPower({ fixtures: [led], circuits: [dimmed], electrical: nec });
    const error = r.findings.find((f) => f.severity === "error");
    expect(error?.message).toMatch(/set that dimmer to non-dim or use a constant-power circuit/);
    expect(error?.fixtureIds).toEqual([31]);
    expect(r.circuits[0].switchModeUnits).toBe(1);
    // 180 VA / 120 V = 1.5 A (I = VA / V)
    expect(r.circuits[0].amps).toBeCloseTo(1.5, 9);
    // the same unit on a constant-power circuit is fine
    const ok = checkPower({ fixtures: [led], circuits: [{ ...dimmed, dimmed: false }], electrical: nec });
    expect(ok.findings.filter((f) => f.severity === "error")).toEqual([]);
  });

  it("a multi-slot lamp type whose load is unset is a lamp, with a warning to set it on a dimmed circuit", () => {
    const load = loadKindOfType({ family: "profile", loadKind: null });
    const u = unit({ id: 32, circuit: "22", footprint: 4, loadKind: load.kind, loadKindSource: load.source });
    const r = checkPower({ fixtures: [u], circuits: [dimmed], electrical: nec });
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(r.findings.find((f) => /set the type's Load to switch-mode/.test(f.message))?.fixtureIds).toEqual([32]);
    // once the type says lamp, no prompt
    const said = checkPower({
      fixtures: [{ ...u, loadKindSource: "set" }],
      circuits: [dimmed],
      electrical: nec,
    });
    expect(said.findings.some((f) => /set the type's Load/.test(f.message))).toBe(false);
  });
});

describe("the types table's Load cell", () => {
  const column = TYPE_COLUMNS.find((c) => c.key === "loadKind")!;
  it("takes lamp or switch-mode, empty for 'go by the family', and names the column otherwise", () => {
    expect(parseTypeCell(column, "switch-mode", "metric")).toEqual({ ok: true, patch: { loadKind: "switch-mode" } });
    expect(parseTypeCell(column, " lamp ", "metric")).toEqual({ ok: true, patch: { loadKind: "lamp" } });
    expect(parseTypeCell(column, "", "metric")).toEqual({ ok: true, patch: { loadKind: null } });
    const bad = parseTypeCell(column, "LED", "metric");
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/^Load: Load must be lamp or switch-mode/);
  });
});
