/**
 * The library ships inside the custom-functions bundle (budget: 300 KB minified for all function
 * code). Its share, data files included, must stay small and must never pull in ajv, which is a
 * test-only dependency here. Bundled with esbuild (installed with tsx) as a quick stand-in for the
 * production webpack build.
 */
import { buildSync } from "esbuild";
import path from "node:path";

// The engine's modules the library imports are left out of the measure (see `external`).
// 120 KB until the verified data (sources, temperature data, new substances) grew it to about
// 120 KB on its own; the change record, pin and export stamp (about 8 KB) are the library's job too.
// Complexes, solids, edetate and their sources (issue 21) added about 10 KB of data.
// The measured conditions of a pKa (schema, the conversion, its words and checks) about 3.5 KB.
// The sources and notes of the values verified in the second round of issue 16 about 2.6 KB more,
// the third round's (lysine, glutamate, phthalate, phosphate pK3) about 1.3 KB (160.2 KB measured).
// Problems in words naming the entry (validate/words.ts, moved down from the pane so that an
// imported file and the command line say them the same way) about 1.5 KB (163.2 KB measured then).
// Malate's pK, ΔrH° and ΔrCp° from Eden & Bates and maleate pK1, with their sources, about 1.6 KB.
// The reasons measured conditions are refused on values that are not converted, about 0.8 KB
// (166.7 KB measured with them).
// Round 4 of issue 16: the calorimetric ΔrH° of TES, glycine and tricine and a textbook table for
// lysine, glutamate and histidine pK1, with their three sources, about 0.5 KB (167.2 KB measured).
const LIBRARY_BUDGET_BYTES = 168 * 1024;

const bundle = (entry: string) =>
  buildSync({
    entryPoints: [path.join(__dirname, "../../src/library", entry)],
    bundle: true,
    minify: true,
    write: false,
    format: "esm",
    platform: "browser",
    target: "es2020",
    metafile: true,
    logLevel: "silent",
    // The engine (src/chem) ships in every bundle anyway; the library's share is measured without
    // it. The library calls the engine's pKa models to convert measured conditions (conditions.ts).
    external: ["../chem/*", "../../chem/*"],
  });

test(`the whole library, data included, minifies under ${LIBRARY_BUDGET_BYTES / 1024} KB without ajv or Node modules`, () => {
  const out = bundle("index.ts");
  const bytes = out.outputFiles[0].contents.length;
  const inputs = Object.keys(out.metafile.inputs);
  expect(inputs.filter((f) => f.includes("node_modules"))).toEqual([]);
  expect(bytes).toBeLessThan(LIBRARY_BUDGET_BYTES);
  expect(bytes).toBeGreaterThan(40 * 1024); // the data files are in it
});

test("only the workbook-settings adapter mentions Excel or Office", () => {
  const out = bundle("index.ts");
  const offenders = Object.keys(out.metafile.inputs).filter((f) => !f.endsWith(".json") && !f.endsWith("workbook-settings.ts"));
  const fs = jest.requireActual<typeof import("node:fs")>("node:fs");
  const touching = offenders.filter((f) => /\b(Excel|Office)\s*[.?]/.test(fs.readFileSync(path.join(__dirname, "../..", f), "utf8")));
  expect(touching).toEqual([]);
});
