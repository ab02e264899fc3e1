/**
 * The workbook library as a whole, in the Files tab: the name written into the change record, the
 * pin (pin the constants of the names the workbook uses; where the built-in library now differs;
 * update deliberately), and the change record itself, newest first.
 */
import { el, announce, replaceChildren as replaceKids } from "../dom";
import type { PaneController } from "../controller";
import { KIND_LABEL } from "../describe";
import { entriesUsed } from "../workbook-uses";
import { button, download, field, message, resultMessage, textArea, textInput } from "./ui";

const SHOWN_CHANGES = 50;

/** "2026-12-02 17:45 UTC". */
const when = (iso: string): string => iso.replace("T", " ").replace(/:\d{2}(\.\d+)?Z$/, " UTC");

export function workbookSection(ctl: PaneController, names: () => string[], status: (node: HTMLElement) => void): HTMLElement {
  const outcome = el("div", { id: "pin-outcome" });
  const done = (r: Awaited<ReturnType<PaneController["pin"]>>): void => {
    status(resultMessage(r));
    announce(r.message);
  };
  const who = field("Your name, for the change record", textInput(ctl.userName, (v) => ctl.setUserName(v), { id: "change-who", autocomplete: "name" }), {
    hint: "Typed once and remembered on this computer; written with every change to the workbook library. Not a signature: nothing checks it.",
  }).wrap;
  const pinNames = textArea(names().join("\n"), () => undefined, 3);
  pinNames.id = "pin-names";
  const pinButton = button("Pin these constants", async () => {
    const r = await ctl.pin(pinNames.value.split(/\r?\n/));
    done(r);
  }, { id: "pin-run" });
  const wb = ctl.library.layers.workbook;
  const drift = ctl.drift();
  const pinState = wb?.pin
    ? message(drift.length ? "warn" : "ok", `Pinned ${when(wb.pin.at)} with built-in library ${wb.pin.builtinVersion}: ${wb.pin.entries.length} entries${wb.pin.fingerprint ? `, fingerprint then ${wb.pin.fingerprint}` : ""}. ${drift.length ? `The built-in library ${ctl.library.version} now differs for ${drift.length} of them; the workbook keeps its pinned values until you update the pin.` : `The built-in library ${ctl.library.version} holds the same values.`}`,
        drift.map((d) => `${d.name} (${KIND_LABEL[d.kind]} ${d.id}): ${d.diff.map((x) => `${x.path} pinned ${x.old ?? "—"}, built-in now ${x.new ?? "—"}`).join("; ")}`),
        drift.length ? el("div", { class: "actions" }, button("Update the pin to the built-in values", async () => done(await ctl.updatePin()), { id: "pin-update" })) : undefined)
    : message("ok", "Nothing is pinned: the workbook's formulas use the built-in values of whichever Protolyte version opens it.");
  pinState.id = "pin-state";
  const changes = [...(wb?.changes ?? [])].reverse();
  const record = changes.length
    ? el(
        "ol",
        { class: "changes", id: "change-record", reversed: true, "aria-label": "Change record, newest first" },
        ...changes.slice(0, SHOWN_CHANGES).map((c) =>
          el(
            "li",
            { "data-action": c.action },
            el("strong", {}, `${when(c.at)} · ${c.who} · ${c.action}`),
            c.entry ? ` ${KIND_LABEL[c.entry.kind]} ${c.name ?? c.entry.id} (${c.entry.id})` : c.name ? ` ${c.name}` : "",
            c.summary ? el("div", {}, c.summary) : null,
            c.diff ? el("ul", {}, ...c.diff.slice(0, 12).map((d) => el("li", {}, `${d.path}: ${d.old ?? "—"} → ${d.new ?? "—"}`)), c.diff.length > 12 ? el("li", {}, `… and ${c.diff.length - 12} more`) : null) : null,
            c.reason ? el("div", {}, `Reason: ${c.reason}`) : null,
          ),
        ),
      )
    : el("p", { class: "hint", id: "change-record" }, "No change to the workbook library has been recorded yet.");
  const uses = el("div", { id: "uses-list", "aria-live": "polite" });
  const readUses = button("Read the workbook's formulas", async () => {
    if (!ctl.workbookNames) return;
    replaceKids(uses, el("p", { class: "hint" }, "Reading the formulas…"));
    try {
      const found = await ctl.workbookNames();
      const used = entriesUsed(ctl.library, found.names);
      const file = ctl.exportEntries(used.refs);
      replaceKids(
        uses,
        el("p", {}, `${found.formulas} AQ formula${found.formulas === 1 ? "" : "s"} name ${found.names.length} substance${found.names.length === 1 ? "" : "s"}; their results use these ${used.rows.length} entries:`),
        el("table", { class: "uses" }, el("thead", {}, el("tr", {}, el("th", { scope: "col" }, "Entry"), el("th", { scope: "col" }, "Layer"), el("th", { scope: "col" }, "Status"))), el("tbody", {}, ...used.rows.map((r) => el("tr", { "data-kind": r.kind, "data-id": r.id }, el("td", {}, `${r.name} (${KIND_LABEL[r.kind]} ${r.id})`), el("td", {}, r.layerText), el("td", {}, r.status || "—"))))),
        used.unknown.length ? message("warn", "Names the library does not know:", used.unknown) : null,
        found.unread.length ? message("warn", "Not read:", found.unread.slice(0, 20)) : null,
        file ? el("div", { class: "actions" }, button("Export exactly these entries", () => download(file.fileName, file.text), { id: "uses-export" })) : null,
      );
    } catch (e) {
      replaceKids(uses, message("error", `The formulas could not be read: ${e instanceof Error ? e.message : String(e)}`));
    }
  }, { id: "uses-read", disabled: ctl.workbookNames === null });
  return el(
    "div",
    { id: "workbook-section" },
    el("h2", {}, "The workbook library"),
    who,
    el("h3", {}, "Entries the workbook's formulas use"),
    el("p", { class: "hint" }, ctl.workbookNames ? "Reads every AQ formula in the used range of each sheet, and the cells its names come from; lists each entry the results depend on with its layer and status, and exports exactly those." : "Inside Excel this reads the workbook's AQ formulas and lists the entries they use; this browser page has no workbook."),
    el("div", { class: "actions" }, readUses),
    uses,
    el("h3", {}, "Pin"),
    el("p", { class: "hint" }, "Pinning copies the constants these names use (their systems, ions, sources and atomic weights) into the workbook library, so that a later Protolyte with revised built-in values does not change this workbook's results."),
    field("Names the workbook uses (one per line)", pinNames, { hint: "Filled from the Try it mixture; add the names your formulas use." }).wrap,
    el("div", { class: "actions" }, pinButton),
    pinState,
    outcome,
    el("h3", {}, "Change record"),
    el("p", { class: "hint" }, "Every change to the workbook library: when, who, what changed (old → new) and the reason given. It is kept in the workbook library and goes out with its exports. It records changes; it is not, by itself, compliance with any regulation."),
    record,
  );
}
