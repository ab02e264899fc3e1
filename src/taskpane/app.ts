/**
 * Wires the controller to the views: renders everything once, re-renders on every change of the
 * library, and routes "edit this" from Browse to the editor tab.
 */
import { byId, replaceChildren } from "./dom";
import type { PaneController } from "./controller";
import { BrowseView } from "./views/browse";
import { EditorView } from "./views/editor";
import { FilesView } from "./views/files";
import { renderHeader, renderProblems } from "./views/header";
import { setupTabs } from "./views/tabs";
import { TryView } from "./views/try";
import { message } from "./views/ui";

export function startApp(ctl: PaneController): void {
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
  const files = new FilesView(byId("panel-files"), ctl, status);
  const tryView = new TryView(byId("panel-try"), ctl);
  showTab = setupTabs(byId("tabs"), () => replaceChildren(statusBox));

  const all = (): void => {
    renderHeader(ctl);
    renderProblems(ctl, status);
    browse.render();
    files.renderPreview();
    tryView.refresh();
  };
  if (ctl.startupWarnings.length) status(message("warn", ctl.startupWarnings.join(" ")));
  editor.render();
  files.render();
  tryView.render();
  all();
  ctl.subscribe(() => {
    all();
    files.render();
  });
  document.body.dataset.ready = "true";
}
