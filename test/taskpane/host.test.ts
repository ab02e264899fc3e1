/** Host detection: Excel, outside Office, office.js missing, Office not answering, another host. */
import { detectHost } from "../../src/taskpane/host";

const office = (onReady: () => Promise<unknown>) => ({ Office: { onReady } });

describe("detectHost", () => {
  test("office.js did not load: a plain browser page", async () => {
    expect(await detectHost({})).toMatchObject({ kind: "browser", reason: "no-office-js" });
  });

  test("Office.onReady with host null: outside Office", async () => {
    expect(await detectHost(office(async () => ({ host: null, platform: null })))).toMatchObject({ kind: "browser", reason: "not-in-office" });
  });

  test("Excel with the Excel namespace", async () => {
    const g = { ...office(async () => ({ host: "Excel", platform: "OfficeOnline" })), Excel: {} };
    expect(await detectHost(g)).toEqual({ kind: "excel", platform: "OfficeOnline" });
  });

  test("Excel reported but no Excel namespace: browser storage", async () => {
    expect(await detectHost(office(async () => ({ host: "Excel", platform: "PC" })))).toMatchObject({ kind: "browser", reason: "other-host" });
  });

  test("another Office application", async () => {
    const r = await detectHost({ ...office(async () => ({ host: "Word", platform: "PC" })), Excel: {} });
    expect(r).toMatchObject({ kind: "browser", reason: "other-host" });
    expect(r.kind === "browser" && r.detail).toMatch(/Word/);
  });

  test("Office.onReady never settles: gives up after the timeout", async () => {
    const started = Date.now();
    const r = await detectHost(office(() => new Promise(() => undefined)), 50);
    expect(r).toMatchObject({ kind: "browser", reason: "timeout" });
    expect(Date.now() - started).toBeLessThan(2000);
  });

  test("Office.onReady rejects", async () => {
    expect(await detectHost(office(async () => Promise.reject(new Error("boom"))))).toMatchObject({ kind: "browser", reason: "error", detail: expect.stringContaining("boom") });
  });
});
