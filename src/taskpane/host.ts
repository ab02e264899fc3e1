/**
 * Where the pane runs. Inside Excel, office.js reports host "Excel" and the `Excel` namespace
 * exists: the workbook layer lives in the workbook's settings. Everywhere else (a plain browser
 * page, office.js blocked or offline, another Office application) the pane works against browser
 * storage and says so.
 */

export type HostInfo =
  | { kind: "excel"; platform: string }
  | { kind: "browser"; reason: "no-office-js" | "not-in-office" | "other-host" | "timeout" | "error"; detail: string };

interface OfficeLike {
  onReady?: (cb?: unknown) => Promise<{ host: unknown; platform: unknown }>;
}

/** How long to wait for Office.onReady before giving up and running as a plain page. */
export const OFFICE_READY_TIMEOUT_MS = 8000;

export async function detectHost(g: Record<string, unknown> = globalThis as unknown as Record<string, unknown>, timeoutMs = OFFICE_READY_TIMEOUT_MS): Promise<HostInfo> {
  const office = g.Office as OfficeLike | undefined;
  if (!office || typeof office.onReady !== "function") {
    return { kind: "browser", reason: "no-office-js", detail: "The Office library (office.js) did not load, offline or blocked: running as a plain browser page" };
  }
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<"timeout">((resolve) => {
    timer = setTimeout(() => resolve("timeout"), timeoutMs);
  });
  try {
    const info = await Promise.race([office.onReady(), timeout]);
    if (info === "timeout") return { kind: "browser", reason: "timeout", detail: "Office did not answer in time: running as a plain browser page" };
    const host = info?.host;
    if (host === null || host === undefined) {
      return { kind: "browser", reason: "not-in-office", detail: "Not running inside Office: running as a plain browser page" };
    }
    if (String(host) === "Excel" && typeof g.Excel === "object" && g.Excel !== null) {
      return { kind: "excel", platform: String(info.platform ?? "") };
    }
    return { kind: "browser", reason: "other-host", detail: `Opened in ${String(host)}, not Excel: running against browser storage` };
  } catch (e) {
    return { kind: "browser", reason: "error", detail: `The Office library failed (${e instanceof Error ? e.message : String(e)}): running as a plain browser page` };
  } finally {
    if (timer !== undefined) clearTimeout(timer);
  }
}
