// A large file reports progress while it is read and checked, not only while it is written.
import { describe, expect, it } from "vitest";
import { BASE_URL } from "./support/api";
import { rigProduction } from "./support/rig";

const cookieOf = (s: unknown) => (s as { cookie: string }).cookie;

describe("import progress", () => {
  it("streams reading and checking progress for a preview of 5,000 rows, then the preview", async () => {
    const { s, id } = await rigProduction();
    const lines = ["Position,Unit,Type,Channel"];
    for (let i = 1; i <= 5000; i++) lines.push(`LX1,${i},Profile 26,${i}`);
    const form = new FormData();
    form.set("file", new File([lines.join("\n")], "big.csv"));
    form.set("options", JSON.stringify({ mode: "preview" }));
    const res = await fetch(`${BASE_URL}/api/productions/${id}/import?stream=1`, {
      method: "POST",
      headers: { cookie: cookieOf(s) },
      body: form,
    });
    expect(res.status).toBe(200);
    const messages = (await res.text())
      .split("\n")
      .filter(Boolean)
      .map((l) => JSON.parse(l));
    const stages = messages.filter((m) => m.progress).map((m) => m.progress);
    expect(stages[0].stage).toBe("reading");
    const checking = stages.filter((p) => p.stage === "checking");
    expect(checking.length).toBeGreaterThan(2); // start, at least one slice, the end
    expect(checking.map((p) => p.done)).toEqual([...checking.map((p) => p.done)].sort((a, b) => a - b));
    expect(checking.at(-1)).toEqual({ stage: "checking", done: 5000, total: 5000 });
    const last = messages.at(-1);
    expect(last.preview.rowCount).toBe(5000);
    expect(last.preview.counts.create).toBe(5000);
    expect((await s.get(`/api/productions/${id}/fixtures`)).json.fixtures).toHaveLength(0); // a preview writes nothing
  });
});
