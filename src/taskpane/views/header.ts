/** The top of the pane: constants fingerprint and version, where the layers live, unreadable stored layers. */
import type { UserLayer } from "../../library";
import { el, replaceChildren, byId, announce } from "../dom";
import type { PaneController } from "../controller";
import { button, download, message, resultMessage } from "./ui";

export function renderHeader(ctl: PaneController): void {
  byId("fingerprint").textContent = ctl.library.fingerprint();
  byId("version").textContent = `· built-in library ${ctl.library.version}`;
  const where = byId("where");
  const host = ctl.host;
  const parts = [
    `Workbook library: ${ctl.stores.workbook.where}`,
    `personal library: ${ctl.stores.personal.where}`,
  ];
  let lead = host.kind === "excel" ? "In Excel." : `${host.detail}.`;
  if (!ctl.persistent) lead += " Browser storage is unavailable: changes last until the page closes.";
  where.textContent = `${lead} ${parts.join("; ")}.`;
}

export function renderProblems(ctl: PaneController, status: (node: HTMLElement) => void): void {
  const root = byId("problems");
  const boxes = [...ctl.problems.values()].map((p) => {
    const layer: UserLayer = p.layer;
    const actions = el("div", { class: "actions" });
    const raw = ctl.exportRaw(layer);
    if (raw) {
      actions.appendChild(button("Export the stored text", () => {
        download(raw.fileName, raw.text, "text/plain");
        announce(`Downloaded ${raw.fileName}`);
      }, { id: `problem-export-${layer}` }));
    }
    const reset = button("Reset…", () => {
      const confirm = el(
        "div",
        { class: "msg error", role: "group", "aria-label": "Confirm reset" },
        el("p", {}, `Reset discards the stored ${layer} library (${ctl.stores[layer].where}) for good${raw ? " (export its text first if you may need it)" : ""}. Reset now?`),
      );
      const yes = button("Reset and discard", async () => {
        const r = await ctl.resetLayer(layer);
        status(resultMessage(r));
        announce(r.message);
      }, { class: "danger", id: `problem-reset-confirm-${layer}` });
      const no = button("Cancel", () => {
        confirm.remove();
        reset.focus();
      });
      confirm.appendChild(el("div", { class: "actions" }, yes, no));
      box.appendChild(confirm);
      no.focus();
    }, { class: "danger", id: `problem-reset-${layer}` });
    actions.appendChild(reset);
    const box = message("error", p.message, ["Nothing has been discarded. Export the stored text to keep it; reset the layer to start it again empty."], actions);
    box.dataset.layer = layer;
    return box;
  });
  replaceChildren(root, ...boxes);
}
