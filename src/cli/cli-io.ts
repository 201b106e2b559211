/** What a command may use of the outside world; tests pass a capturing implementation. */
export interface CliIo {
  /** Writes to standard output. */
  stdout(text: string): void;
  /** Writes to standard error. */
  stderr(text: string): void;
  /** Whether standard output is a terminal (colour and charts). */
  stdoutIsTTY: boolean;
  /** Whether standard error is a terminal (progress bars). */
  stderrIsTTY: boolean;
  /** Width of the terminal standard output writes to, in columns; undefined when it is not a terminal (no wrapping). */
  stdoutColumns?: number;
  /** Width of the terminal standard error writes to, in columns, when it is one. */
  stderrColumns?: number;
  /** Working directory that relative paths resolve against. */
  cwd: string;
}

/** A CliIo that collects output in strings, for in-process tests. */
export function captureIo(cwd = process.cwd()): CliIo & { out: string; err: string } {
  const io = {
    out: '',
    err: '',
    stdoutIsTTY: false,
    stderrIsTTY: false,
    cwd,
    stdout(text: string) {
      io.out += text;
    },
    stderr(text: string) {
      io.err += text;
    },
  };
  return io;
}

/**
 * The process's own streams. When the reader of standard output or error goes away (a pipe into `head`),
 * further output is dropped quietly instead of ending in an unhandled EPIPE; the command still
 * finishes and its files are still written.
 */
export function processIo(): CliIo {
  return {
    stdout: quietOnClosedPipe(process.stdout),
    stderr: quietOnClosedPipe(process.stderr),
    stdoutIsTTY: Boolean(process.stdout.isTTY),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    // Lines fit the terminal: its width, else COLUMNS, else 100 (output piped to a file or a pager).
    stdoutColumns: process.stdout.isTTY && process.stdout.columns ? process.stdout.columns : envColumns() ?? 100,
    stderrColumns: process.stderr.isTTY && process.stderr.columns ? process.stderr.columns : envColumns() ?? 100,
    cwd: process.cwd(),
  };
}

/** The COLUMNS environment variable as a width, when it is a sensible whole number. */
function envColumns(): number | undefined {
  const v = Number(process.env.COLUMNS);
  return Number.isInteger(v) && v >= 40 && v <= 1000 ? v : undefined;
}

/** A writer to `stream` that stops writing, without an error, once the stream's reader has gone. */
function quietOnClosedPipe(stream: NodeJS.WriteStream): (text: string) => void {
  let readerGone = false;
  stream.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code !== 'EPIPE') throw e;
    readerGone = true;
  });
  return (text) => void (readerGone || stream.write(text));
}
