// The netbrace bin: the real process around the dispatcher (dispatch.ts).
import { main } from './dispatch.js';

main(process.argv.slice(2), {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
  cwd: process.cwd(),
  env: process.env,
  stdoutIsTTY: Boolean(process.stdout.isTTY),
  stderrIsTTY: Boolean(process.stderr.isTTY),
}).then(
  (code) => void (process.exitCode = code),
  (error: unknown) => {
    process.stderr.write(`netbrace: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 2;
  },
);
