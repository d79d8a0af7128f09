// The workflow `netbrace init --workflow` writes, and the code-owners lines that guard it.
// Pure text: the shell decides where it goes. The job's name is the check's name, which a
// branch protection rule or ruleset requires; keep it stable (CHECK_NAME).

import { DEFAULT_POLICY_PATH } from './defaults.js';

/** The name of the check a repository requires: the workflow job's `name`. */
export const CHECK_NAME = 'netbrace';

export const WORKFLOW_PATH = '.github/workflows/netbrace.yml';
export const CODEOWNERS_PATH = '.github/CODEOWNERS';

/** Placeholder for the action reference when the caller did not give one. */
export const ACTION_PLACEHOLDER = 'OWNER/netbrace@0000000000000000000000000000000000000000';

export interface WorkflowOptions {
  /** `owner/repo@<40-hex commit>`: netbrace pinned by commit. */
  action: string;
  /** The version the commit carries, for the comment beside the pin. */
  version: string;
  /** The policy's path from the repository root (left out when it is the default one). */
  policyPath: string;
}

/** The ready workflow: pull requests and pushes to the default branch, block mode, least privilege. */
export function workflowText(o: WorkflowOptions): string {
  return `# netbrace: judge every changed network design before it merges.
# Written by "netbrace init --workflow". The job's name (${CHECK_NAME}) is the check to require
# in branch protection or a repository ruleset: see the README, "Making it block".
name: ${CHECK_NAME}
on:
  pull_request:
  push:
    branches: [main]

permissions:
  contents: read           # read the designs, the policy and their history
  pull-requests: write     # the one living comment on the pull request

jobs:
  ${CHECK_NAME}:
    name: ${CHECK_NAME}
    runs-on: ubuntu-latest
    steps:
      - uses: actions/checkout@v5
        with:
          fetch-depth: 0     # full history: the base of the pull request is always there
      - uses: ${o.action}  # ${o.version}
        with:${o.policyPath === DEFAULT_POLICY_PATH ? '' : `\n          policy: ${o.policyPath}`}
          mode: block
          comment: when-changed
`;
}

/** Code-owners lines: changes to the policy and the workflow need the owners' review. */
export function codeownersText(owners: string, policyPath: string): string {
  return `# netbrace: the rules that judge network designs, and the workflow that runs them.
/${policyPath} ${owners}
/${WORKFLOW_PATH} ${owners}
`;
}

/** What to do on GitHub so that a failing check blocks the merge (printed after writing). */
export function requiredCheckSteps(owners: string | undefined): string {
  return [
    'To make the check block merges:',
    `  1. Commit the files and open a pull request; the check "${CHECK_NAME}" runs once.`,
    '  2. Settings → Rules → Rulesets → New branch ruleset (or Settings → Branches → branch protection',
    '     rule) for the default branch: "Require status checks to pass", add the check',
    `     "${CHECK_NAME}", and "Require a pull request before merging" with "Require review from Code Owners".`,
    owners === undefined
      ? `  3. Add the policy and ${WORKFLOW_PATH} to ${CODEOWNERS_PATH} (give --owners to have it written).`
      : `  3. The code owners (${owners}) must review every change to the policy and the workflow.`,
    '  Organisations: a ruleset at the organisation level can require this workflow in every repository (README).',
  ].join('\n');
}
