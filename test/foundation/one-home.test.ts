/**
 * One home for each rule: the temperature default and range, the activity models' names and their
 * message, what counts as a number in text, and how names pair with amounts are each defined in one
 * module of src/chem. These checks fail when a second definition appears elsewhere in src/ (a copy
 * that could drift), so a caller has to ask the home module.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { ACTIVITY_MODEL_IDS, ACTIVITY_MODELS, activityModelChoices } from "../../src/chem";

const root = join(__dirname, "..", "..");
const src = join(root, "src");

function tsFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const p = join(dir, d.name);
    if (d.isDirectory()) return tsFiles(p);
    return d.name.endsWith(".ts") ? [p] : [];
  });
}

/** Code lines of every .ts file in src/ (comment lines left out: JSDoc may describe a rule). */
const files = tsFiles(src).map((file) => ({
  file: relative(root, file).split("\\").join("/"),
  lines: readFileSync(file, "utf8")
    .split("\n")
    .map((text, i) => ({ text, line: i + 1 }))
    .filter(({ text }) => !/^\s*(\*|\/\/|\/\*)/.test(text)),
}));

/** "file:line: text" of every code line outside the home files that matches the pattern. */
function copies(pattern: RegExp, homes: readonly string[]): string[] {
  return files
    .filter((f) => !homes.includes(f.file))
    .flatMap((f) => f.lines.filter((l) => pattern.test(l.text)).map((l) => `${f.file}:${l.line}: ${l.text.trim()}`));
}

describe("each rule has one home", () => {
  test("the default temperature (25 °C) and the 0–100 °C range: src/chem/defaults.ts, checked in validate-options.ts", () => {
    expect(copies(/(\?\?|fallback:|temperatureC:|=)\s*25(\.0*)?\b(?!\s*(mM|mL|%))/, ["src/chem/defaults.ts"])).toEqual([]);
    expect(copies(/TEMPERATURE_M(IN|AX)|\bm(in|ax)TemperatureC\b/, ["src/chem/defaults.ts", "src/chem/validate-options.ts"])).toEqual([]);
    expect(copies(/outside \$?\{?[^}]*\}?[0-9]*–/, ["src/chem/validate-options.ts"]).filter((l) => /°C/.test(l))).toEqual([]);
  });

  test("the activity models' names and message: src/chem/activity/models.ts", () => {
    const quotedId = new RegExp(`["'\`](${ACTIVITY_MODEL_IDS.map((id) => id.replace(/-/g, "\\-")).join("|")})["'\`]`);
    // the engine's default names one model: that is the default's home, not a copy of the list
    expect(copies(quotedId, ["src/chem/activity/models.ts", "src/chem/defaults.ts"])).toEqual([]);
    expect(copies(/not known.*(davies|ideal)|(davies|ideal).*debye/i, ["src/chem/activity/models.ts"])).toEqual([]);
  });

  test("the functions' metadata lists every activity model, the default first", () => {
    const jsdoc = readFileSync(join(src, "functions", "functions.ts"), "utf8");
    const params = jsdoc.split("\n").filter((l) => /@param \[activity\]/.test(l));
    expect(params.length).toBeGreaterThan(0);
    for (const p of params) expect(p).toContain(activityModelChoices().replace('"davies"', '"davies" (default)'));
    expect(ACTIVITY_MODEL_IDS[0]).toBe("davies");
    for (const id of ACTIVITY_MODEL_IDS) expect(ACTIVITY_MODELS[id].names[0]).toBe(id);
  });

  test("what counts as a number in text: src/chem/number-text.ts", () => {
    // a decimal pattern written as a regular expression (digits, optional point, digits)
    expect(copies(/\\d[+*]\\\.\??\\d|\[\\d\.\]\+|\[-\+\]\?\[\\d/, ["src/chem/number-text.ts"])).toEqual([]);
    // and the looser shapes "\d+(?:\.\d+)?" and "\d[\d.,]*" (a number found inside longer text: compose
    // it from UNSIGNED_DECIMAL_SOURCE instead)
    expect(copies(/\\d\+\(\?:\\\.\\d|\\d\[\\d\./, ["src/chem/number-text.ts"])).toEqual([]);
  });

  test("how names pair with amounts: src/chem/name-amount-pairs.ts", () => {
    expect(copies(/no substance name beside it|no amount for '|give one amount per name|the mixture is empty/, ["src/chem/name-amount-pairs.ts"])).toEqual([]);
    expect(copies(/\(item \$\{/, ["src/chem/name-amount-pairs.ts"])).toEqual([]);
  });

  test("the ionic-strength limit (1 mol/L, no pH-derived number beyond it): LIMITS in src/chem/defaults.ts, enforced in src/chem/ionic-limit.ts", () => {
    // a comparison of an ionic strength with a number, or the limit's constant, outside its homes
    expect(copies(/[iI]onicStrength\s*[<>]=?\s*(?!0\b)\d|MAX_TRUSTED_IONIC|maxIonicStrength\b/, ["src/chem/defaults.ts", "src/chem/ionic-limit.ts"]).filter((l) => !/LIMITS\.maxIonicStrength/.test(l) || /=\s*\d/.test(l))).toEqual([]);
    expect(copies(/beyond the \$\{?[^}]*\}? ?mol\/L limit|trustIonicStrength/, ["src/chem/ionic-limit.ts"])).toEqual([]);
  });
});
