import { describe, expect, it } from "vitest";
import { printPageCss } from "@/app/(app)/productions/[productionId]/cues/_components/cue-sheet";

describe("the printed cue sheet's page boxes", () => {
  it("name the production and the print time, and number the pages 'page x of y'", () => {
    const css = printPageCss({ paper: "A4", productionName: "Salt and Lantern", printedAt: "5 Dec 2026, 15:30" });
    expect(css).toContain("size: A4");
    expect(css).toContain('@top-left { content: "Salt and Lantern" " · cue sheet"');
    expect(css).toContain('@top-right { content: "printed 5 Dec 2026, 15:30"');
    // CSS Paged Media: counter(page) and counter(pages) in a margin box
    expect(css).toContain('content: "page " counter(page) " of " counter(pages)');
  });

  it("keeps a name with quotes, backslashes or line breaks inside its string", () => {
    const css = printPageCss({ paper: "letter", productionName: 'The "Ghost" \\ Act\n2', printedAt: "x" });
    expect(css).toContain('content: "The \\"Ghost\\" \\\\ Act 2" " · cue sheet"');
  });
});
