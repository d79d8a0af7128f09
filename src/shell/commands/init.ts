// `netbrace init`: write the commented starter policy (the built-in policy, spelled out) so a
// team can start from what already applies and tighten it; with --workflow also the workflow
// that runs the check and the code-owners lines that guard both. Never overwrites a file.

import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UsageError } from '../../errors.js';
import { mkdir } from 'node:fs/promises';
import { DEFAULT_POLICY_PATH, STARTER_POLICY } from '../../policy/defaults.js';
import {
  ACTION_PLACEHOLDER,
  CODEOWNERS_PATH,
  codeownersText,
  requiredCheckSteps,
  WORKFLOW_PATH,
  workflowText,
} from '../../policy/workflow-template.js';
import { VERSION } from '../../version.js';
import { repoRoot } from '../git.js';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs } from '../args.js';

const HELP = `Usage: netbrace init [--policy FILE] [--workflow [--action REF] [--owners OWNERS]]

Write a commented starter policy: the built-in policy that applies when a repository has
none, spelled out key by key, with examples of floors to set. It is written to
${DEFAULT_POLICY_PATH} at the repository root (or FILE). An existing file is never overwritten.

  --workflow         also write ${WORKFLOW_PATH}: pull requests and pushes, block
                     mode, full-depth checkout, only the permissions it needs; and, with
                     --owners, ${CODEOWNERS_PATH} lines for the policy and the workflow.
                     Then prints the steps that make the check required.
  --action REF       netbrace pinned by commit, OWNER/REPO@<40-character SHA> (default: a
                     placeholder to replace)
  --owners OWNERS    code owners, e.g. "@acme/network-planning" (several separated by spaces)

Next: set the floors for your network, then run "netbrace check".

Examples:
  netbrace init                          writes .netbrace.yaml at the repository root
  netbrace init --policy org/base.yaml   a base policy that team policies inherit

Exit codes:
  0  written
  2  usage error, or the file exists already
`;

const OWNER = /^@[A-Za-z0-9][A-Za-z0-9-]*(\/[A-Za-z0-9._-]+)?$|^[^@\s]+@[^@\s]+\.[^@\s]+$/;

/** Create `target` with `text`; false when it exists already (never overwritten). */
async function create(target: string, text: string, shown: string): Promise<boolean> {
  try {
    // "wx": create, and fail if the file exists, in one step (no race between check and write).
    await writeFile(target, text, { flag: 'wx' });
    return true;
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') return false;
    if (code === 'ENOENT') throw new UsageError(`cannot write ${shown}: its folder does not exist`);
    throw e;
  }
}

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values } = parseCommandArgs(
    'init',
    args,
    {
      policy: { type: 'string' },
      workflow: { type: 'boolean' },
      action: { type: 'string' },
      owners: { type: 'string' },
    },
    false,
  );
  if (!values.workflow && (values.action !== undefined || values.owners !== undefined)) {
    throw new UsageError('--action and --owners go with --workflow', 'add --workflow');
  }
  const action = values.action ?? ACTION_PLACEHOLDER;
  if (values.action !== undefined && !/^[A-Za-z0-9_.-]+\/[A-Za-z0-9_.-]+@[0-9a-f]{40}$/.test(values.action)) {
    throw new UsageError(
      `--action ${values.action} is not OWNER/REPO@<40-character commit SHA>`,
      'pin by the full commit: tags can be moved (README, "Pinning")',
    );
  }
  const owners = values.owners?.trim().split(/\s+/).filter(Boolean);
  for (const o of owners ?? [])
    if (!OWNER.test(o)) throw new UsageError(`--owners: "${o}" is not @user, @org/team or an e-mail address`);

  const root = (await repoRoot(io.cwd)) ?? io.cwd;
  const target =
    values.policy !== undefined ? path.resolve(io.cwd, values.policy) : path.join(root, DEFAULT_POLICY_PATH);
  const shown = path.relative(io.cwd, target) || target;
  if (!(await create(target, STARTER_POLICY, shown))) {
    if (!values.workflow)
      throw new UsageError(
        `${shown} exists already; netbrace init never overwrites a policy`,
        'edit it, or give another --policy FILE',
      );
    io.stdout(`kept ${shown}: it exists already (never overwritten)\n`);
  } else
    io.stdout(
      `wrote ${shown}: the built-in policy, commented. Set the floors for your network, then run "netbrace check".\n`,
    );
  if (!values.workflow) return 0;

  const policyPath = path.relative(root, target).split(path.sep).join('/');
  if (policyPath.startsWith('..'))
    throw new UsageError(`the policy ${shown} is outside the repository`, 'the workflow reads it from the repository');
  const wfTarget = path.join(root, WORKFLOW_PATH);
  const wfShown = path.relative(io.cwd, wfTarget) || wfTarget;
  await mkdir(path.dirname(wfTarget), { recursive: true });
  if (await create(wfTarget, workflowText({ action, version: `v${VERSION}`, policyPath }), wfShown)) {
    io.stdout(`wrote ${wfShown}: the check "netbrace" on every pull request, in block mode\n`);
    if (action === ACTION_PLACEHOLDER)
      io.stdout(
        `  replace ${ACTION_PLACEHOLDER} by the repository and commit you take netbrace from (README, "Pinning")\n`,
      );
  } else io.stdout(`kept ${wfShown}: it exists already (never overwritten); compare it with "netbrace init --help"\n`);

  const ownersText = owners && owners.length > 0 ? codeownersText(owners.join(' '), policyPath) : undefined;
  if (ownersText) {
    const coTarget = path.join(root, CODEOWNERS_PATH);
    const coShown = path.relative(io.cwd, coTarget) || coTarget;
    if (await create(coTarget, ownersText, coShown))
      io.stdout(`wrote ${coShown}: the policy and the workflow need their owners' review\n`);
    else io.stdout(`kept ${coShown}: it exists already (never overwritten); add these lines:\n${ownersText}`);
  }
  io.stdout(`\n${requiredCheckSteps(ownersText ? owners!.join(' ') : undefined)}\n`);
  return 0;
}

export const initCommand: Command = {
  name: 'init',
  summary: 'write a commented starter policy (.netbrace.yaml)',
  help: HELP,
  run,
};
