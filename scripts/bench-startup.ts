/**
 * Part (g) of `npm run bench`: the command line's start-up. One `protolyte eval` of the compiled
 * command line (dist/cli/protolyte.js) against `node -e "require('hyperformula')"` (Node starting
 * and loading the spreadsheet engine, the least any headless evaluation needs), run alternately,
 * side by side, so both see the same machine load. Wall time of each run, and the CPU time of the
 * child (user + system, from /proc/self/stat's cutime and cstime of waited-for children, in clock
 * ticks of usually 10 ms). Best of RUNS each. Target: eval ≤ 3× the HyperFormula load.
 */
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

const TICKS_PER_SECOND = 100; // Linux USER_HZ

/** CPU seconds of this process's waited-for children so far (Linux; NaN elsewhere). */
function childrenCpu(): number {
  try {
    const stat = readFileSync("/proc/self/stat", "utf8");
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    // Fields 16 and 17 of stat (cutime, cstime) are at 13 and 14 after the command name.
    return (Number(fields[13]) + Number(fields[14])) / TICKS_PER_SECOND;
  } catch {
    return Number.NaN;
  }
}

function timed(args: string[], cwd: string): { wall: number; cpu: number; ok: boolean } {
  const cpu0 = childrenCpu();
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { cwd, encoding: "utf8" });
  const wall = Number(process.hrtime.bigint() - t0) / 1e9;
  return { wall, cpu: childrenCpu() - cpu0, ok: r.status === 0 };
}

export function partStartup(root: string, runs: number, table: (header: string[], rows: string[][]) => void): void {
  console.log("\n(g) Command-line start-up: one eval against Node loading HyperFormula, alternately");
  const compiled = join(root, "dist", "cli", "protolyte.js");
  if (!existsSync(compiled)) {
    console.log("    building the command line: npx webpack --mode production --config-name cli");
    spawnSync("npx", ["webpack", "--mode", "production", "--config-name", "cli", "--stats", "errors-warnings"], { cwd: root, encoding: "utf8" });
  }
  if (!existsSync(compiled)) {
    console.log("    dist/cli/protolyte.js could not be built: part (g) not measured");
    return;
  }
  const evalArgs = [compiled, "eval", '=AQ.PH({"acetic acid";"sodium acetate"},{0.05;0.05})'];
  const loadArgs = ["-e", "require('hyperformula')"];
  const best = { eval: { wall: Infinity, cpu: Infinity }, load: { wall: Infinity, cpu: Infinity } };
  for (let i = 0; i < runs; i++) {
    for (const [key, args] of [["eval", evalArgs], ["load", loadArgs]] as const) {
      const t = timed(args, root);
      if (!t.ok) {
        console.log(`    ${key} failed: part (g) not measured`);
        return;
      }
      best[key].wall = Math.min(best[key].wall, t.wall);
      best[key].cpu = Math.min(best[key].cpu, t.cpu);
    }
  }
  const ms = (s: number): string => `${(s * 1000).toFixed(0)} ms`;
  table(
    ["run (best of " + runs + ")", "wall", "CPU"],
    [
      ["protolyte eval '=AQ.PH(…)' (dist/cli/protolyte.js)", ms(best.eval.wall), ms(best.eval.cpu)],
      ["node -e \"require('hyperformula')\"", ms(best.load.wall), ms(best.load.cpu)],
    ],
  );
  const wallRatio = best.eval.wall / best.load.wall;
  const cpuRatio = best.eval.cpu / best.load.cpu;
  console.log(`    ratio eval / HyperFormula load: ${wallRatio.toFixed(2)}× wall, ${cpuRatio.toFixed(2)}× CPU`);
  console.log(`    target: ≤ 3× (wall): ${wallRatio <= 3 ? "met" : "NOT met"}`);
}
