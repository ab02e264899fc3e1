/**
 * Wires the controller to the views: renders everything once, re-renders on every change of the
 * library, routes "edit this" from Browse to the editor tab, and tells the Picture view when it is
 * opened or left (it follows Excel's selection only while open).
 */
import { byId, replaceChildren } from "./dom";
import type { PaneController } from "./controller";
import { BrowseView } from "./views/browse";
import { EditorView } from "./views/editor";
import { FilesView } from "./views/files";
import { renderHeader, renderProblems } from "./views/header";
import { setupTabs } from "./views/tabs";
import { TryView } from "./views/try";
import { PictureView } from "./views/picture";
import type { SelectionExcel } from "./excel-selection";
import { readWorkbookNames } from "./excel-workbook-uses";
import { message } from "./views/ui";

export interface AppOptions {
  /** Excel's API inside Excel (the Picture view follows the selected cell), null in a browser page. */
  excel?: SelectionExcel | null;
}

export function startApp(ctl: PaneController, opts: AppOptions = {}): void {
  const excel = opts.excel ?? null;
  if (excel) ctl.workbookNames = () => readWorkbookNames(excel);
  const statusBox = byId("status");
  const status = (node: HTMLElement): void => replaceChildren(statusBox, node);
  let showTab: (id: string) => void = () => undefined;
  const editor = new EditorView(byId("panel-edit"), ctl, status);
  const browse = new BrowseView(byId("panel-browse"), ctl, {
    edit(draft) {
      showTab("tab-edit");
      editor.open(draft);
    },
    status,
  });
  const tryView = new TryView(byId("panel-try"), ctl);
  const files = new FilesView(byId("panel-files"), ctl, status, () => tryView.mixture().rows.map((r) => r.name.trim()).filter((n) => n !== ""));
  const picture = new PictureView(byId("panel-picture"), ctl, { tryMixture: () => tryView.mixture(), excel: opts.excel ?? null });
  showTab = setupTabs(byId("tabs"), (panel) => {
    replaceChildren(statusBox);
    if (panel === "panel-files") files.render(); // the pin offers the Try it names as they are now
    if (panel === "panel-picture") picture.show();
    else picture.hide();
  });

  const all = (): void => {
    renderHeader(ctl);
    renderProblems(ctl, status);
    browse.render();
    files.renderPreview();
    tryView.refresh();
    picture.refresh();
  };
  if (ctl.startupWarnings.length) status(message("warn", ctl.startupWarnings.join(" ")));
  editor.render();
  files.render();
  tryView.render();
  picture.render();
  all();
  ctl.subscribe(() => {
    all();
    files.render();
  });
  document.body.dataset.ready = "true";
}
