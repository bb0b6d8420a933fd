// No two modules of the plot import each other, directly or round a longer loop. The import graph is
// read with TypeScript's own pre-processor (type-only and dynamic imports count: a cycle of types still
// ties two files together), followed through everything the plot folders reach, and searched for
// strongly connected components (Tarjan's algorithm). Runs in the unit suite, so a new cycle fails `npm test`.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(__dirname, "../../..");
const PLOT_FOLDERS = [
  "app/(app)/productions/[productionId]/plot",
  "components/plot",
  "lib/plot",
  "app/(app)/productions/[productionId]/cues/_components/cue-plan-canvas.tsx",
];
const EXTENSIONS = ["", ".ts", ".tsx", "/index.ts", "/index.tsx"];

function sourcesUnder(rel: string): string[] {
  const abs = path.join(ROOT, rel);
  if (statSync(abs).isFile()) return [abs];
  return readdirSync(abs, { recursive: true, encoding: "utf8" })
    .filter((f) => /\.tsx?$/.test(f))
    .map((f) => path.join(abs, f));
}

function resolve(spec: string, from: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = path.join(ROOT, spec.slice(2));
  else if (spec.startsWith(".")) base = path.resolve(path.dirname(from), spec);
  else return null; // a package
  for (const ext of EXTENSIONS) {
    const f = base + ext;
    if (existsSync(f) && statSync(f).isFile() && /\.tsx?$/.test(f)) return f;
  }
  return null; // a stylesheet, JSON or the like: not part of a module cycle
}

/** Every module reachable from `starts`, with the modules each imports. */
function importGraph(starts: string[]): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  const todo = [...starts];
  while (todo.length) {
    const file = todo.pop()!;
    if (graph.has(file)) continue;
    const info = ts.preProcessFile(readFileSync(file, "utf8"), true, true);
    const deps = [
      ...new Set(info.importedFiles.map((i) => resolve(i.fileName, file)).filter((f): f is string => f !== null)),
    ];
    graph.set(file, deps);
    todo.push(...deps);
  }
  return graph;
}

/** Tarjan's strongly connected components; a component of two or more files (or a file importing itself) is a cycle. */
function cycles(graph: Map<string, string[]>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string) => {
    index.set(v, next);
    low.set(v, next++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const scc: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        scc.push(w);
      } while (w !== v);
      if (scc.length > 1 || (graph.get(v) ?? []).includes(v)) found.push(scc.map((f) => path.relative(ROOT, f)).sort());
    }
  };
  for (const v of graph.keys()) if (!index.has(v)) visit(v);
  return found;
}

describe("import cycles", () => {
  it("finds a cycle when there is one (the finder itself works)", () => {
    // hand-made graph: a → b → c → a, and d → a (d is outside the loop)
    const g = new Map([
      ["/a", ["/b"]],
      ["/b", ["/c"]],
      ["/c", ["/a"]],
      ["/d", ["/a"]],
      ["/e", ["/e"]],
    ]);
    const found = cycles(g).map((c) => c.map((f) => path.basename(f)).sort());
    expect(found).toContainEqual(["a", "b", "c"]);
    expect(found).toContainEqual(["e"]);
    expect(found).toHaveLength(2);
  });

  it("reads imports the way the app writes them (alias, relative, type-only, dynamic)", () => {
    const canvas = path.join(ROOT, "app/(app)/productions/[productionId]/plot/_components/plot-canvas.tsx");
    const editor = path.join(ROOT, "app/(app)/productions/[productionId]/plot/_components/plot-editor.tsx");
    const g = importGraph([editor]);
    expect(g.get(editor)).toContain(canvas); // loaded with a dynamic import()
    expect(g.get(canvas)).toContain(path.join(ROOT, "components/plot/use-view-navigation.ts")); // "@/..." alias
  });

  it("has none among the plot's modules and everything they reach", () => {
    const graph = importGraph(PLOT_FOLDERS.flatMap(sourcesUnder));
    expect(graph.size).toBeGreaterThan(40); // the walk really followed the imports
    expect(cycles(graph)).toEqual([]);
  });
});
