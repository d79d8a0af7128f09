// `netbrace init`: write the commented starter policy (the built-in policy, spelled out) so a
// team can start from what already applies and tighten it. Never overwrites a file.

import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UsageError } from '../../errors.js';
import { DEFAULT_POLICY_PATH, STARTER_POLICY } from '../../policy/defaults.js';
import { repoRoot } from '../git.js';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs } from '../args.js';

const HELP = `Usage: netbrace init [--policy FILE]

Write a commented starter policy: the built-in policy that applies when a repository has
none, spelled out key by key, with examples of floors to set. It is written to
${DEFAULT_POLICY_PATH} at the repository root (or FILE). An existing file is never overwritten.

Next: set the floors for your network, then run "netbrace check".

Examples:
  netbrace init                          writes .netbrace.yaml at the repository root
  netbrace init --policy org/base.yaml   a base policy that team policies inherit

Exit codes:
  0  written
  2  usage error, or the file exists already
`;

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values } = parseCommandArgs('init', args, { policy: { type: 'string' } }, false);
  const root = (await repoRoot(io.cwd)) ?? io.cwd;
  const target = values.policy !== undefined ? path.resolve(io.cwd, values.policy) : path.join(root, DEFAULT_POLICY_PATH);
  const shown = path.relative(io.cwd, target) || target;
  try {
    // "wx": create, and fail if the file exists, in one step (no race between check and write).
    await writeFile(target, STARTER_POLICY, { flag: 'wx' });
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') throw new UsageError(`${shown} exists already; netbrace init never overwrites a policy`, 'edit it, or give another --policy FILE');
    if (code === 'ENOENT') throw new UsageError(`cannot write ${shown}: its folder does not exist`);
    throw e;
  }
  io.stdout(`wrote ${shown}: the built-in policy, commented. Set the floors for your network, then run "netbrace check".\n`);
  return 0;
}

export const initCommand: Command = {
  name: 'init',
  summary: 'write a commented starter policy (.netbrace.yaml)',
  help: HELP,
  run,
};
