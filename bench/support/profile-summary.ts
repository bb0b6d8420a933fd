// Summarises a V8 CPU profile (node --cpu-prof) of the app server by where the time went: self time
// grouped by package (node_modules/<name>) or by the app's own source, plus the top functions.
// Usage: tsx bench/support/profile-summary.ts <file.cpuprofile> [top]
import { readFileSync } from "node:fs";

type Node = {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
};
type Profile = { nodes: Node[]; samples: number[]; timeDeltas: number[]; startTime: number; endTime: number };

const [file, topArg] = process.argv.slice(2);
const profile: Profile = JSON.parse(readFileSync(file, "utf8"));
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const self = new Map<number, number>();
profile.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)));

function group(url: string, fn: string): string {
  if (!url) return fn.startsWith("(") ? fn : `(native) ${fn}`;
  const pkg = url.match(/node_modules\/((?:@[^/]+\/)?[^/]+)/);
  if (pkg) return pkg[1];
  if (url.startsWith("node:")) return url;
  return url.replace(/^.*\/(\.next[^/]*)\//, "$1/");
}

const groups = new Map<string, number>();
const fns = new Map<string, number>();
for (const [id, us] of self) {
  const n = byId.get(id) as Node;
  const { url, functionName, lineNumber } = n.callFrame;
  const g = group(url, functionName);
  groups.set(g, (groups.get(g) ?? 0) + us);
  const f = `${functionName || "(anonymous)"} ${g}:${lineNumber + 1}`;
  fns.set(f, (fns.get(f) ?? 0) + us);
}
const total = [...groups.values()].reduce((a, b) => a + b, 0);
const show = (m: Map<string, number>, top: number) =>
  [...m]
    .sort((a, b) => b[1] - a[1])
    .slice(0, top)
    .forEach(([k, us]) =>
      console.log(`${((100 * us) / total).toFixed(1).padStart(5)} %  ${(us / 1000).toFixed(0).padStart(7)} ms  ${k}`),
    );
console.log(`${file}: ${(total / 1e6).toFixed(1)} s sampled\n-- by package or source --`);
show(groups, 25);
console.log("-- top functions (self time) --");
show(fns, Number(topArg ?? 30));
