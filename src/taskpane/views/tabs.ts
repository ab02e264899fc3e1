/** Tabs (ARIA tab pattern): click or arrow keys, Home/End; one panel shown at a time. */
export function setupTabs(list: HTMLElement, onShow: (panelId: string) => void): (tabId: string) => void {
  const tabs = Array.from(list.querySelectorAll<HTMLButtonElement>("[role=tab]"));
  const select = (tab: HTMLButtonElement, focus = true): void => {
    for (const t of tabs) {
      const on = t === tab;
      t.setAttribute("aria-selected", String(on));
      t.tabIndex = on ? 0 : -1;
      const panel = document.getElementById(t.getAttribute("aria-controls") as string);
      if (panel) panel.hidden = !on;
    }
    if (focus) tab.focus();
    onShow(tab.getAttribute("aria-controls") as string);
  };
  for (const t of tabs) t.addEventListener("click", () => select(t));
  list.addEventListener("keydown", (e) => {
    const i = tabs.indexOf(document.activeElement as HTMLButtonElement);
    if (i < 0) return;
    const next = { ArrowRight: i + 1, ArrowLeft: i - 1, Home: 0, End: tabs.length - 1 }[e.key];
    if (next === undefined) return;
    e.preventDefault();
    select(tabs[(next + tabs.length) % tabs.length]);
  });
  return (tabId: string) => {
    const t = tabs.find((x) => x.id === tabId);
    if (t) select(t, false);
  };
}
