#!/usr/bin/env node
import { createRequire as __nbCreateRequire } from 'node:module';
const require = __nbCreateRequire(import.meta.url);

// src/shell/commands/index.ts
var commands = [];

// src/errors.ts
var NetbraceError = class extends Error {
  name = "NetbraceError";
  kind;
  file;
  line;
  column;
  hint;
  /** Further locations that belong to the same problem (e.g. the floor an override loosens). */
  related;
  constructor(kind, message, where = {}, hint = "", related = []) {
    super(message);
    this.kind = kind;
    this.file = where.file ?? "";
    this.line = where.line ?? 0;
    this.column = where.column ?? 0;
    this.hint = hint;
    this.related = related;
  }
  /** `file:line:col: message — hint`, the one format every shell prints. */
  format() {
    return formatDiagnostic(this);
  }
};
function formatDiagnostic(d) {
  const where = d.file ? `${d.file}:${d.line || 1}:${d.column || 1}: ` : "";
  let text = `${where}${d.message}${d.hint ? ` — ${d.hint}` : ""}`;
  for (const r of d.related ?? []) text += `
  ${r.file}:${r.line || 1}:${r.column || 1}: ${r.message}`;
  return text;
}
function isNetbraceError(e) {
  return e instanceof NetbraceError;
}

// src/version.ts
var VERSION = "0.1.0";

// src/shell/cli.ts
var EXIT_CODES_HELP = `Exit codes:
  0  pass (or nothing to judge)
  1  the gate failed: a requirement was broken or a design could not be read
  2  usage or configuration error (bad option, broken policy); nothing was evaluated`;
function generalHelp() {
  const width = Math.max(...commands.map((c) => c.name.length), 4);
  const list = commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`).join("\n");
  return `netbrace ${VERSION} — robustness gate for network designs kept in git

Usage: netbrace <command> [options]

Commands:
${list}

Run "netbrace <command> --help" for a command's options and examples.

${EXIT_CODES_HELP}
`;
}
async function main(argv, io) {
  const [name, ...rest] = argv;
  if (name === void 0 || name === "--help" || name === "-h" || name === "help") {
    const topic = name === "help" ? commands.find((c) => c.name === rest[0]) : void 0;
    io.stdout(topic ? topic.help : generalHelp());
    return 0;
  }
  if (name === "--version" || name === "-V") {
    io.stdout(`${VERSION}
`);
    return 0;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    io.stderr(`netbrace: unknown command "${name}" — run "netbrace --help" for the list
`);
    return 2;
  }
  if (rest.includes("--help") || rest.includes("-h")) {
    io.stdout(command.help);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (error) {
    if (isNetbraceError(error)) {
      io.stderr(`${formatDiagnostic(error)}
`);
      return error.kind === "design" ? 1 : 2;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.stderr(`netbrace: internal error: ${message}
  please report this with the command you ran
`);
    return 2;
  }
}
function isEntry() {
  const entry = process.argv[1] ?? "";
  return /(?:^|[\\/])(?:cli\.(?:js|ts)|netbrace)$/.test(entry);
}
if (isEntry()) {
  const io = {
    stdout: (t) => process.stdout.write(t),
    stderr: (t) => process.stderr.write(t),
    cwd: process.cwd(),
    env: process.env,
    stdoutIsTTY: Boolean(process.stdout.isTTY),
    stderrIsTTY: Boolean(process.stderr.isTTY)
  };
  main(process.argv.slice(2), io).then(
    (code) => {
      process.exitCode = code;
    },
    (error) => {
      process.stderr.write(`netbrace: ${error instanceof Error ? error.message : String(error)}
`);
      process.exitCode = 2;
    }
  );
}
export {
  EXIT_CODES_HELP,
  generalHelp,
  main
};
