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

/** The process's own streams. */
export function processIo(): CliIo {
  return {
    stdout: (text) => void process.stdout.write(text),
    stderr: (text) => void process.stderr.write(text),
    stdoutIsTTY: Boolean(process.stdout.isTTY),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    cwd: process.cwd(),
  };
}
