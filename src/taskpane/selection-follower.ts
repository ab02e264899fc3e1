/**
 * Following Excel's selection while a view is open, without the DOM: start() registers the
 * selection handlers and reads the selected cell; every selection change schedules a read after a
 * short quiet time (dragging a selection fires many events); reads never overlap, and a change
 * during a read is followed by one more read, so the last selection always wins; stop() removes the
 * handlers. Each finished read is passed to `onRead`.
 */
import { readSelectedMixture, watchSelection, type SelectedMixture, type SelectionExcel } from "./excel-selection";

/** Wait this long after a selection change before reading. */
export const SELECTION_DEBOUNCE_MS = 150;

export class SelectionFollower {
  latest: SelectedMixture | null = null;
  private stopWatch: (() => Promise<void>) | null = null;
  private starting: Promise<void> | null = null;
  private active = false;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private reading: Promise<void> | null = null;
  private again = false;

  constructor(
    private readonly excel: SelectionExcel,
    private readonly onRead: (s: SelectedMixture) => void,
    private readonly onWatchError: (message: string) => void = () => undefined,
    private readonly debounceMs = SELECTION_DEBOUNCE_MS,
  ) {}

  get following(): boolean {
    return this.stopWatch !== null;
  }

  /** Register the handlers (once) and read the selected cell now. */
  start(): Promise<void> {
    this.active = true;
    this.schedule(0);
    if (this.stopWatch || this.starting) return this.starting ?? Promise.resolve();
    this.starting = watchSelection(this.excel, () => this.schedule())
      .then(async (stop) => {
        if (this.active) this.stopWatch = stop;
        else await stop().catch(() => undefined); // stopped while registering
      })
      .catch((e: unknown) => this.onWatchError(e instanceof Error ? e.message : String(e)))
      .finally(() => {
        this.starting = null;
      });
    return this.starting;
  }

  /** Remove the handlers; pending reads are dropped. */
  async stop(): Promise<void> {
    this.active = false;
    clearTimeout(this.timer);
    if (this.starting) await this.starting;
    const stop = this.stopWatch;
    this.stopWatch = null;
    if (stop) await stop().catch(() => undefined);
  }

  /** Read the selected cell again (soon, or after `delay` ms). */
  schedule(delay = this.debounceMs): void {
    if (!this.active) return;
    clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.read(), delay);
  }

  /** Resolves when no read is pending. */
  async settled(): Promise<void> {
    while (this.reading) await this.reading;
  }

  private async read(): Promise<void> {
    if (this.reading) {
      this.again = true;
      return;
    }
    this.reading = (async () => {
      do {
        this.again = false;
        this.latest = await readSelectedMixture(this.excel);
      } while (this.again);
    })();
    try {
      await this.reading;
    } finally {
      this.reading = null;
    }
    if (this.active && this.latest) this.onRead(this.latest);
  }
}
