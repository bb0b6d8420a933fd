import { describe, expect, it } from "vitest";
import { showReportText } from "@/lib/notes/show-report-text";

describe("show report e-mail text", () => {
  it("carries the performance, summary, every logged fault and every note written", () => {
    const m = showReportText(
      "Invented Play",
      {
        id: 1,
        performance: "Evening 3",
        performedOn: "2026-12-05",
        summary: "Smooth.",
        authorId: 1,
        status: "sent",
        sentAt: "2026-12-05T22:10:00.000Z",
        sentBy: 1,
        version: 2,
        createdAt: "",
        updatedAt: "",
        items: [],
        noteIds: [5],
        faults: [{ id: 1, fixtureId: 2, kind: "lamp_out", description: "unit dark in act two" }],
      },
      [{ body: "Lamp out in Evening 3", kind: "work" } as never],
    );
    expect(m.subject).toBe("Show report: Invented Play, Evening 3");
    expect(m.text).toContain("Smooth.");
    expect(m.text).toContain("- Lamp out: unit dark in act two");
    expect(m.text).toContain("- [Work] Lamp out in Evening 3");
  });
});
