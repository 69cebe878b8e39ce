/**
 * What a command may touch: output streams, the working directory and the environment.
 * `main()` takes one so the whole CLI runs in-process in tests with captured output.
 */
export interface CliIo {
  /** Write to standard output (text includes its own newlines). */
  stdout(text: string): void;
  /** Write to standard error. */
  stderr(text: string): void;
  /** Standard output is a terminal (colour, progress bars). */
  stdoutIsTTY: boolean;
  /** Standard error is a terminal (progress bars go there). */
  stderrIsTTY: boolean;
  /** Directory relative paths are resolved against. */
  cwd: string;
  /** Environment (NO_COLOR, ...). */
  env: Readonly<Record<string, string | undefined>>;
}

/** The real process streams. */
export function processIo(): CliIo {
  return {
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    stdoutIsTTY: Boolean(process.stdout.isTTY),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    cwd: process.cwd(),
    env: process.env,
  };
}

/** An in-memory Io for tests: read `.out` and `.err` after `main()` returns. */
export function captureIo(overrides: Partial<CliIo> = {}): CliIo & { out: string; err: string } {
  const io = {
    out: '',
    err: '',
    stdout(t: string) {
      io.out += t;
    },
    stderr(t: string) {
      io.err += t;
    },
    stdoutIsTTY: false,
    stderrIsTTY: false,
    cwd: process.cwd(),
    env: {} as Record<string, string | undefined>,
    ...overrides,
  };
  return io;
}
