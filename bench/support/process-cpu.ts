// CPU time used by a process and its children, read from /proc (Linux): on a shared machine the wall
// clock depends on the neighbours, while the CPU a request costs does not (much), so the load bench
// reports both.
import { readdirSync, readFileSync } from "node:fs";

const TICKS_PER_SECOND = 100; // USER_HZ, the unit of utime and stime in /proc/<pid>/stat (man 5 proc); 100 on Linux

/** utime + stime of one process (ms), or 0 when it is gone. */
function ownCpuMs(pid: number): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    // The command name (field 2) may hold spaces; the fields after its closing bracket are fixed.
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / TICKS_PER_SECOND;
  } catch {
    return 0;
  }
}

function childrenOf(pid: number): number[] {
  const out: number[] = [];
  for (const name of readdirSync("/proc")) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, "utf8");
      if (Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]) === pid) out.push(Number(name));
    } catch {
      // gone meanwhile
    }
  }
  return out;
}

/** CPU ms used so far by `pid` and its descendants that are still running. */
export function treeCpuMs(pid: number): number {
  let total = ownCpuMs(pid);
  for (const child of childrenOf(pid)) total += treeCpuMs(child);
  return total;
}
