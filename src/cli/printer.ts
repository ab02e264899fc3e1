/**
 * Where the command line writes: results on stdout (collected and written in large chunks, which
 * the stream drains before the process ends by itself), notes, error cells and the summary on
 * stderr, each prefixed "protolyte: " where it is a message of ours.
 */
export interface Printer {
  /** One line of results. */
  out(line: string): void;
  /** One line for the person at the terminal (stderr). */
  note(line: string): void;
  /** Writes what is collected. */
  flush(): void;
}

const CHUNK = 1 << 16;

export function processPrinter(stdout: NodeJS.WritableStream = process.stdout, stderr: NodeJS.WritableStream = process.stderr): Printer {
  let pending: string[] = [];
  let size = 0;
  const flush = (): void => {
    if (pending.length === 0) return;
    stdout.write(`${pending.join("\n")}\n`);
    pending = [];
    size = 0;
  };
  return {
    out(line) {
      pending.push(line);
      size += line.length + 1;
      if (size >= CHUNK) flush();
    },
    note(line) {
      flush();
      stderr.write(`protolyte: ${line}\n`);
    },
    flush,
  };
}
