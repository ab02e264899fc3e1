/**
 * The --out file: checked before any work (extension, a writable place, not a directory, never the
 * input itself under another name), then written to a temporary file beside it and renamed, so a
 * failed run never leaves half a file where the user's file was.
 */
import { accessSync, constants, realpathSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { basename, dirname, extname, join, resolve } from "node:path";
import { describeFsError } from "./input";
import { UsageError } from "./options";

export type OutKind = "csv" | "xlsx";

/** The real path a file has, or would have once created (its folder resolved). */
function realTarget(file: string): string {
  try {
    return realpathSync(file);
  } catch {
    try {
      return join(realpathSync(dirname(resolve(file))), basename(file));
    } catch {
      return resolve(file);
    }
  }
}

/** Throws a UsageError naming the problem with `out`; returns the kind of file to write. */
export function checkOutPath(out: string, input: string): OutKind {
  const ext = extname(out).toLowerCase();
  if (ext !== ".csv" && ext !== ".xlsx") throw new UsageError(`cannot write '${out}': the output must end in .csv or .xlsx`);
  if (realTarget(out) === realTarget(input)) {
    throw new UsageError(`refusing to write '${out}': it is the input file, and its formulas would be replaced by values; choose another --out`);
  }
  let exists = false;
  try {
    const stat = statSync(out);
    exists = true;
    if (stat.isDirectory()) throw new UsageError(`cannot write '${out}': it is a directory`);
    accessSync(out, constants.W_OK);
  } catch (e) {
    if (e instanceof UsageError) throw e;
    if (exists || (e as NodeJS.ErrnoException).code !== "ENOENT") throw new UsageError(`cannot write '${out}': ${describeFsError(e)}`);
  }
  const folder = dirname(resolve(out));
  try {
    if (!statSync(folder).isDirectory()) throw Object.assign(new Error("not a directory"), { code: "ENOTDIR" });
    accessSync(folder, constants.W_OK);
  } catch (e) {
    throw new UsageError(`cannot write '${out}': folder '${folder}': ${describeFsError(e)}`);
  }
  return ext === ".csv" ? "csv" : "xlsx";
}

/** Writes the bytes beside `out` first, then renames: the old file stays whole until the new one is. */
export function writeAtomically(out: string, data: string | Buffer): void {
  const temporary = join(dirname(resolve(out)), `.${basename(out)}.protolyte-${process.pid}.tmp`);
  try {
    writeFileSync(temporary, data);
    renameSync(temporary, out);
  } catch (e) {
    rmSync(temporary, { force: true });
    throw new UsageError(`cannot write '${out}': ${describeFsError(e)}`);
  }
}
