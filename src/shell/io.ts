// The I/O a command may use, injected so commands are testable without a real process.

export interface CommandIO {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  cwd: string;
  env: Readonly<Record<string, string | undefined>>;
  /** True when stdout is an interactive terminal (colour, charts width). */
  stdoutIsTTY: boolean;
  stderrIsTTY: boolean;
}

/** A subcommand: `run` returns the exit code (0 pass, 1 gate failed, 2 usage/config error). */
export interface Command {
  name: string;
  /** One line for the command list in `netbrace --help`. */
  summary: string;
  /** Full help text with usage and examples, printed by `netbrace <command> --help`. */
  help: string;
  run(args: string[], io: CommandIO): Promise<number>;
}
