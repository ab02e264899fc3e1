/**
 * Supply chain: what ships has no high or critical advisories (`npm audit --omit=dev`, through
 * scripts/audit.mjs), and the production bundles contain no way to run text as code (eval, the
 * Function constructor, string timers), which test/foundation/bundle.test.ts checks only in part.
 *
 * The audit needs the npm registry's advisory endpoint. Whether it could run is decided here, when
 * the file is loaded: advisories fail the test; an audit that could not run (no network, a mirror
 * without the endpoint) is reported as a skipped test whose title gives npm's reason — never as a
 * pass and never as a failure of the product. `npm run audit` runs the same check on demand.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

const root = join(__dirname, "..", "..");
const script = join(root, "scripts", "audit.mjs");
const dist = join(root, "dist");

function audit(env: Record<string, string> = {}): { status: number | null; out: string } {
  const r = spawnSync(process.execPath, [script], { cwd: root, encoding: "utf8", timeout: 150_000, env: { ...process.env, ...env } });
  return { status: r.status, out: `${r.stdout}${r.stderr}`.trim() };
}

/** The real audit, run once while the file loads, so that "could not run" can become a skip with its reason. */
const live = audit();
const notRun = live.status === 2 || live.status === null ? (live.out.split("\n")[0].replace(/^AUDIT NOT RUN:\s*/, "") || "no answer from npm") : null;
(notRun === null ? test : test.skip)(
  notRun === null
    ? "npm audit --omit=dev: no high or critical advisories"
    : `npm audit --omit=dev (NOT RUN, the npm registry's advisory endpoint could not be used: ${notRun})`,
  () => {
    if (live.status !== 0) throw new Error(`${live.out}\n\n(scripts/audit.mjs exit ${live.status}: 1 = advisories found)`);
    expect(live.out).toMatch(/^AUDIT OK/);
  },
);

describe("scripts/audit.mjs verdicts on saved npm answers", () => {
  const dir = mkdtempSync(join(tmpdir(), "protolyte-audit-"));
  const saved = (name: string, body: unknown) => {
    const file = join(dir, name);
    writeFileSync(file, typeof body === "string" ? body : JSON.stringify(body));
    return file;
  };
  const counts = (high: number, critical: number) => ({ info: 0, low: 1, moderate: 2, high, critical, total: 3 + high + critical });

  test("clean (only low and moderate): exit 0", () => {
    const file = saved("clean.json", { auditReportVersion: 2, vulnerabilities: { x: { name: "x", severity: "moderate", via: [] } }, metadata: { vulnerabilities: counts(0, 0), dependencies: { prod: 14 } } });
    expect(audit({ PROTOLYTE_AUDIT_REPORT: file })).toEqual({ status: 0, out: expect.stringMatching(/^AUDIT OK: .*moderate 2.*14 production packages/) });
  });

  test("a high advisory: exit 1 naming the package", () => {
    const file = saved("high.json", {
      auditReportVersion: 2,
      vulnerabilities: { "evil-pkg": { name: "evil-pkg", severity: "high", range: "<1.2.3", via: [{ title: "Prototype pollution", url: "https://github.com/advisories/GHSA-xxxx" }], fixAvailable: true } },
      metadata: { vulnerabilities: counts(1, 0), dependencies: { prod: 14 } },
    });
    const r = audit({ PROTOLYTE_AUDIT_REPORT: file });
    expect(r.status).toBe(1);
    expect(r.out).toMatch(/AUDIT FAILED: 1 production package/);
    expect(r.out).toMatch(/evil-pkg \(high, <1\.2\.3\): Prototype pollution https:\/\/github\.com\/advisories\/GHSA-xxxx — a fix is available/);
  });

  test("the endpoint refusing the request: exit 2 saying the audit did not run, npm's reason kept, its address left out", () => {
    const file = saved("refused.json", { message: "405 Method Not Allowed - POST https://mirror.example.invalid/advisories/bulk", statusCode: 405 });
    const r = audit({ PROTOLYTE_AUDIT_REPORT: file });
    expect(r.status).toBe(2);
    expect(r.out).toMatch(/^AUDIT NOT RUN: 405 Method Not Allowed - POST \(the advisory endpoint\)/);
    expect(r.out).toMatch(/not checked/);
    expect(r.out).not.toMatch(/mirror\.example/);
  });

  test("no answer at all (offline): exit 2", () => {
    const r = audit({ PROTOLYTE_AUDIT_REPORT: saved("empty.txt", "") });
    expect(r.status).toBe(2);
    expect(r.out).toMatch(/^AUDIT NOT RUN/);
  });
});

/** Ways to run text as code, each with an example the scanner must catch. */
const CODE_FROM_TEXT: [string, RegExp, string][] = [
  ["eval(…)", /\beval\s*\(/, "x=eval ('1')"],
  ["indirect eval", /\(\s*0\s*,\s*eval\s*\)|\b(?:window|self|globalThis|global)\s*\.\s*eval\b|\[\s*["'`]eval["'`]\s*\]/, "var g=globalThis.eval;"],
  ["new Function(…)", /\bnew\s+Function\s*\(/, "f=new  Function('a','return a')"],
  ["Function('…') without new", /(?:^|[^.\w$])Function\s*\(\s*["'`]/, "return Function(\"return this\")()"],
  ["a constructor called with code text", /\.constructor\s*\(\s*["'`]/, "[].fill.constructor('alert(1)')()"],
  ["a timer given a string", /\bset(?:Timeout|Interval|Immediate)\s*\(\s*["'`]/, "setTimeout('tick()',10)"],
];

describe("the production bundles run no text as code", () => {
  const files = existsSync(dist) ? readdirSync(dist).filter((f) => f.endsWith(".js")) : [];

  test("dist/ holds the built bundles (npm test builds them first)", () => {
    expect(files).toEqual(expect.arrayContaining(["functions.js", "taskpane.js"]));
  });

  test.each(CODE_FROM_TEXT)("the scanner catches %s", (_what, pattern, example) => {
    expect(pattern.test(example)).toBe(true);
    expect(pattern.test("evaluate(x); isFunction(y); Function.prototype.call; new Functional()")).toBe(false);
  });

  test.each(CODE_FROM_TEXT)("bundles are free of: %s", (_what, pattern) => {
    const hits = files.flatMap((file) => {
      const js = readFileSync(join(dist, file), "utf8");
      const m = new RegExp(pattern.source, "g").exec(js);
      return m ? [`${file}: …${js.slice(Math.max(0, m.index - 60), m.index + 60)}…`] : [];
    });
    expect(hits).toEqual([]);
  });
});
