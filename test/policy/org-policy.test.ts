// Floors across teams and repositories: the organisation's policy comes from a second checkout
// (GateDeps.readOrgPolicy), the repository's policy must inherit it, and may only tighten it.
import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { runGate, type GateRequest } from '../../src/run-gate.js';
import { gateFixture, memoryDeps, pairRepo } from '../gate/memory-repo.js';

const ORG = 'org-policy/org.yaml';
const ORG_TEXT = `# The organisation's floor (invented).
requirements:
  - kind: n-1
    element: link
    min: 0.7
`;
const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block', orgPolicyPath: ORG };
const orgReader = (files: Record<string, string>) => ({ readOrgPolicy: (p: string) => files[p] ?? null });

async function error(p: Promise<unknown>): Promise<PolicyError> {
  const e = await p.then(
    () => undefined,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(PolicyError);
  return e as PolicyError;
}

describe('organisation policy', () => {
  it('a team policy that does not inherit it is refused, naming both files', async () => {
    const repo = pairRepo('ring-to-chain');
    const e = await error(runGate(request, memoryDeps(repo, orgReader({ [ORG]: ORG_TEXT }))));
    expect(e.format()).toContain(
      '.netbrace.yaml:1:1: .netbrace.yaml does not inherit the organisation policy org-policy/org.yaml',
    );
    expect(e.related.map((r) => r.file)).toEqual([ORG]);
  });

  it('a team policy that inherits it and loosens its floor is refused with both lines', async () => {
    const repo = pairRepo('ring-to-chain');
    const team = gateFixture('inherits/team.yaml').replace('inherits: org.yaml', `inherits: ${ORG}`);
    repo.base['.netbrace.yaml'] = team;
    repo.head['.netbrace.yaml'] = team;
    const e = await error(runGate(request, memoryDeps(repo, orgReader({ [ORG]: ORG_TEXT }))));
    const text = e.format();
    expect(text).toMatch(/^\.netbrace\.yaml:\d+:\d+: /);
    expect(e.related.some((r) => r.file === ORG && r.line === 5)).toBe(true); // the org's `min: 0.7`
  });

  it('a team policy that inherits and tightens it judges the change; the org floor applies', async () => {
    const repo = pairRepo('ring-to-chain');
    const team = `inherits: ${ORG}\nrequirements:\n  - kind: no-new-spof\n`;
    repo.base['.netbrace.yaml'] = team;
    repo.head['.netbrace.yaml'] = team;
    const { report, exitCode } = await runGate(request, memoryDeps(repo, orgReader({ [ORG]: ORG_TEXT })));
    expect(exitCode).toBe(1);
    expect(report.policy.files).toEqual(['.netbrace.yaml', ORG]);
    expect(report.files[0].requirements.some((r) => r.id.startsWith('n-1') && r.threshold === 0.7)).toBe(true);
    expect(report.policy.changed).toBeUndefined(); // the org file is not in the history: not "changed"
  });

  it('a change cannot take the org policy from the pull request: its files come from the second checkout only', async () => {
    const repo = pairRepo('ring-to-chain');
    const team = `inherits: ${ORG}\n`;
    repo.base['.netbrace.yaml'] = team;
    repo.head['.netbrace.yaml'] = team;
    repo.head[ORG] = 'requirements: []\n'; // a copy committed in the change is ignored
    const { report } = await runGate(request, memoryDeps(repo, orgReader({ [ORG]: ORG_TEXT })));
    expect(report.files[0].requirements.some((r) => r.id.startsWith('n-1'))).toBe(true);
  });

  it('without a policy of its own the repository is judged by the organisation\u2019s', async () => {
    const repo = pairRepo('ring-to-chain');
    delete repo.base['.netbrace.yaml'];
    delete repo.head['.netbrace.yaml'];
    const { report } = await runGate(request, memoryDeps(repo, orgReader({ [ORG]: ORG_TEXT })));
    expect(report.policy).toMatchObject({ source: 'file', path: ORG });
    expect(report.files[0].requirements.some((r) => r.id.startsWith('n-1') && r.threshold === 0.7)).toBe(true);
  });
});
