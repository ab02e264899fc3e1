/**
 * Runs the compiled command line (dist/cli/protolyte.js, made by `npm run build`, which `npm test`
 * runs before jest) as a user does, and through a real shell pipe where it matters.
 */
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { join } from "node:path";

export const root = join(__dirname, "..", "..", "..");
export const compiled = join(root, "dist", "cli", "protolyte.js");

export function requireBuild(): void {
  if (!existsSync(compiled)) throw new Error("dist/cli/protolyte.js is missing: run `npm run build` first (npm test does)");
}

export interface Run {
  code: number | null;
  out: string;
  err: string;
}

/** `node`: options for Node itself (e.g. a heap limit), placed before the program. */
export function run(args: string[], options: { cwd?: string; input?: string | Buffer; node?: string[] } = {}): Run {
  const r = spawnSync(process.execPath, [...(options.node ?? []), compiled, ...args], { cwd: options.cwd ?? root, encoding: "utf8", input: options.input, maxBuffer: 256 * 1024 * 1024 });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const shellQuote = (s: string): string => `'${s.replace(/'/g, `'\\''`)}'`;

/** `protolyte ARGS | READER` in a shell: what arrives at the far end of a real pipe, and the CLI's own exit status. */
export function runPiped(args: string[], reader: string): { code: number; out: string; err: string } {
  const command = `${shellQuote(process.execPath)} ${shellQuote(compiled)} ${args.map(shellQuote).join(" ")} | ${reader}; echo "status:\${PIPESTATUS[0]}" >&2`;
  const r = spawnSync("bash", ["-c", command], { cwd: root, encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
  const status = /status:(\d+)/.exec(r.stderr);
  return { code: status ? Number(status[1]) : -1, out: r.stdout, err: r.stderr.replace(/status:\d+\n?/, "") };
}
