/**
 * What the pane's Browse shows of the "pitzer" model for a library entry
 * (src/chem/activity/pitzer-provenance.ts): every parameter set with its source and status, read
 * from data/pitzer-parameters.ts, and the rule for species without parameters.
 */
import { pitzerCoverage, pitzerRuleText } from "../../src/chem";
import { BINARY, PSI, THETA } from "../../src/chem/data/pitzer-parameters";

test("phosphate: Pitzer & Mayorga's binary sets for its three anions with Na⁺ and K⁺, and Hershey et al.'s chloride mixing terms, each with source and status", () => {
  const c = pitzerCoverage("system", "phosphate");
  expect(c.species).toEqual(["H2PO4-", "HPO4^2-", "PO4^3-"]);
  const naH2 = c.lines.find((l) => l.kind === "binary" && l.ions.join() === "Na+,H2PO4-")!;
  const record = BINARY.find((p) => p.cation === "Na+" && p.anion === "H2PO4-")!;
  expect(naH2.values).toBe(`β0 = ${String(record.beta0).replace("-", "−")}, β1 = ${record.beta1}, Cφ = ${record.cphi}`);
  expect(naH2.source).toBe(record.source);
  expect(naH2.source).toMatch(/Pitzer & Mayorga, J\. Phys\. Chem\. 77, 2300 \(1973\)/);
  // Pitzer & Mayorga's table was not seen here: from memory, unverified, and flagged
  expect(naH2).toMatchObject({ status: "memory", flagged: true, statusText: "from memory, unverified (the primary table was not seen here)" });
  expect(naH2.source).not.toMatch(/pytzer|compilation/);
  const theta = c.lines.find((l) => l.kind === "theta" && l.ions.includes("HPO4^2-"))!;
  expect(theta.source).toMatch(/Hershey, Fernandez & Millero/);
  expect(theta.status).toBe("published");
  // every set that names a phosphate species is listed, and no other
  const names = new Set(["H2PO4-", "HPO4-2", "PO4-3"]);
  const expected = BINARY.filter((p) => names.has(p.anion)).length + [...THETA, ...PSI].filter((p) => p.ions.some((n) => names.has(n))).length;
  expect(c.lines).toHaveLength(expected);
  expect(c.rules).toEqual([]);
});

test("a value from memory is flagged and says so once (sodium with acetate; θ of H⁺ and K⁺); a seen one is not (θ of K⁺ and Na⁺)", () => {
  const acetate = pitzerCoverage("system", "acetate").lines.find((l) => l.ions.join() === "Na+,CH3COO-")!;
  expect(acetate.flagged).toBe(true);
  expect(acetate.statusText).toBe("from memory, unverified (the primary table was not seen here)");
  const hk = pitzerCoverage("ion", "k").lines.find((l) => l.kind === "theta" && l.ions.includes("H+"))!;
  expect(hk).toMatchObject({ flagged: true, statusText: "from memory, unverified (the primary table was not seen here)" });
  expect(hk.source).toMatch(/^Harvie, Møller & Weare, Geochim\. Cosmochim\. Acta 48, 723 \(1984\)/);
  const kna = pitzerCoverage("ion", "k").lines.find((l) => l.kind === "theta" && l.ions.includes("Na+"))!;
  expect(kna).toMatchObject({ flagged: false, values: "θ = −0.0032" });
  expect(kna.source).toMatch(/^Geochem\. Trans\. 6, 19 \(2005\)/);
});

test("citrate borrows the phosphate analogue, Tris and histidine take Davies, a system the model does not name says so", () => {
  expect(pitzerCoverage("system", "citrate").rules.map((r) => pitzerRuleText(r))).toEqual([
    "H2Cit- has no published Pitzer parameters here: the parameters of H2PO4- are used (a stated rule of this engine, not published values).",
    "HCit^2- has no published Pitzer parameters here: the parameters of HPO4^2- are used (a stated rule of this engine, not published values).",
    "Cit^3- has no published Pitzer parameters here: the parameters of PO4^3- are used (a stated rule of this engine, not published values).",
  ]);
  expect(pitzerCoverage("system", "tris")).toEqual({ species: ["TrisH+"], lines: [], rules: [{ ion: "TrisH+" }] });
  expect(pitzerCoverage("system", "histidine").rules.map((r) => r.ion)).toEqual(["H3His^2+", "H2His+", "His-"]);
  const hepes = pitzerCoverage("system", "hepes");
  expect(hepes.lines).toEqual([]);
  expect(pitzerRuleText(hepes.rules[0])).toMatch(/Davies γ is used for them \(the fallback rule\)/);
  expect(pitzerCoverage("ion", "na").lines.length).toBeGreaterThan(10);
});

test("every parameter names its published source and no program: 'published' (seen) or 'from memory, unverified' with the primary named", () => {
  for (const p of [...BINARY, ...THETA, ...PSI]) {
    const where = `${"cation" in p ? `${p.cation}–${p.anion}` : p.ions.join(", ")}`;
    expect({ where, source: p.source }).not.toEqual({ where, source: expect.stringMatching(/pytzer|compilation|\.py\b/i) });
    expect({ where, note: p.note ?? "" }).not.toEqual({ where, note: expect.stringMatching(/pytzer|compilation|\.py\b/i) });
    expect({ where, cited: /\(\d{4}\)/.test(p.source) }).toEqual({ where, cited: true });
    if (p.status === "memory") expect({ where, note: p.note }).toEqual({ where, note: expect.stringMatching(/^from memory, unverified/) });
  }
});
