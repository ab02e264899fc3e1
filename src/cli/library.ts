/**
 * The constants in effect for a run, set up as the task pane sets them: the workbook's own library
 * (read from the XLSX, decoded and validated by the same storage code the pane uses) and the files
 * given with --library (each validated as the pane's import validates a file; several are merged
 * in the order given, as the pane's "merge" import does), placed in the library's own layers
 * (src/library/active.ts decides their order). Anything damaged, newer, missing or invalid is one
 * line naming it, and the run stops: constants are never replaced silently.
 */
import { readFileSync } from "node:fs";
import { getActiveLibrary, issueWords, loadLayer, mergeLibraryDocs, parseLibraryText, setLayer, type LibraryDoc } from "../library";
import { workbookStorage } from "./workbook-library";

export class LibraryError extends Error {}

export interface LibraryInUse {
  fingerprint: string;
  /** "built-in", "built-in + workbook", "built-in + workbook + 2 --library files" … */
  layers: string;
  /** Entries made unusable by the merged library (dangling references, hidden names). */
  warnings: string[];
}

function readText(file: string): string {
  try {
    return readFileSync(file, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a directory" : code === "EACCES" ? "permission denied" : (e as Error).message;
    throw new LibraryError(`cannot read library file '${file}': ${why}`);
  }
}

/**
 * Sets the layers and returns what is in effect. `workbookText`: the stored library text of the
 * workbook (null when it carries none, or when --no-workbook-library asked to leave it out).
 */
export async function useLibraries(workbookText: string | null, files: readonly string[]): Promise<LibraryInUse> {
  const parts = ["built-in"];
  if (workbookText !== null) {
    const loaded = await loadLayer("workbook", workbookStorage(workbookText));
    if (!loaded.ok) {
      throw new LibraryError(
        `the workbook's own constants library cannot be used (${loaded.code}): ${loaded.message}. ` +
          "Repair it in Excel's Protolyte pane, or run with --no-workbook-library to compute with the built-in constants",
      );
    }
    parts.push("workbook");
  }
  if (files.length > 0) {
    const lib = getActiveLibrary();
    const below: LibraryDoc[] = [lib.layers.builtin, ...(lib.layers.workbook ? [lib.layers.workbook] : [])];
    let merged: LibraryDoc | null = null;
    for (const file of files) {
      const parsed = parseLibraryText(readText(file), merged ? [...below, merged] : below);
      if (!parsed.ok) throw new LibraryError(`library file '${file}' is not usable: ${parsed.message}`);
      merged = mergeLibraryDocs(merged, parsed.library);
    }
    const applied = setLayer("personal", merged);
    if (!applied.ok) throw new LibraryError(`the --library files do not fit together: ${applied.message}`);
    parts.push(files.length === 1 ? "--library file" : `${files.length} --library files`);
  }
  const lib = getActiveLibrary();
  const warnings = lib.problems.filter((p) => p.severity === "error").map((p) => issueWords(lib.layers[p.layer], p, `${p.layer} library`));
  return { fingerprint: lib.fingerprint(), layers: parts.join(" + "), warnings };
}
