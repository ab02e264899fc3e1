/**
 * A worker thread of `protolyte table --workers N` (src/cli/table.ts): it sets up the same constants
 * as the main thread, then turns each batch of rows it is sent into results (table-rows.ts).
 * Messages in: { libraries } once, then { seq, layout, rows }; out: { ready, fingerprint } once,
 * then { seq, results } (or { failed } with a message, which ends the run).
 */
import { parentPort, workerData } from "node:worker_threads";
import "../functions/runtime-shim";
import { useLibraries } from "./library";
import { computeRows, type TableLayout } from "./table-rows";

interface Batch {
  seq: number;
  layout: TableLayout;
  rows: string[][];
}

async function start(): Promise<void> {
  const port = parentPort;
  if (port === null) return;
  try {
    const library = await useLibraries(null, (workerData as { libraries: string[] }).libraries);
    port.postMessage({ ready: true, fingerprint: library.fingerprint });
  } catch (error) {
    port.postMessage({ failed: (error as Error).message });
    return;
  }
  port.on("message", (batch: Batch) => {
    try {
      port.postMessage({ seq: batch.seq, results: computeRows(batch.layout, batch.rows) });
    } catch (error) {
      port.postMessage({ failed: (error as Error).message });
    }
  });
}

void start();
