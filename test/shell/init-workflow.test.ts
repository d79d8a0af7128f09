// `netbrace init --workflow`: the workflow, the code-owners lines and the steps that make the
// check required, written into a scratch repository; nothing existing is ever overwritten.
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parse as parseYaml } from 'yaml';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { recordIO } from './helpers-io.js';

const repoRoot = path.resolve(import.meta.dirname, '..', '..');
const SHA = 'a'.repeat(40);
const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
});

function repo(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-init-'));
  scratch.push(dir);
  execFileSync('git', ['init', '-q', '-b', 'main'], { cwd: dir });
  return dir;
}

async function init(cwd: string, ...args: string[]) {
  const io = recordIO(cwd, { NO_COLOR: '1' });
  const code = await main(['init', ...args], io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

type Workflow = {
  name: string;
  on: Record<string, unknown>;
  permissions: Record<string, string>;
  jobs: Record<string, { name: string; steps: { uses?: string; with?: Record<string, unknown> }[] }>;
};

describe('netbrace init --workflow', () => {
  it('writes a workflow with least privilege, a pinned netbrace, full-depth checkout and block mode', async () => {
    const dir = repo();
    const r = await init(dir, '--workflow', '--owners', '@acme/planning', '--action', `acme/netbrace@${SHA}`);
    expect(r.code, r.err).toBe(0);
    const wf = parseYaml(readFileSync(path.join(dir, '.github/workflows/netbrace.yml'), 'utf8')) as Workflow;
    expect(Object.keys(wf.on).sort()).toEqual(['pull_request', 'push']);
    // Only what it needs: read the repository, write the one comment (GitHub's permission names).
    expect(wf.permissions).toEqual({ contents: 'read', 'pull-requests': 'write' });
    const job = wf.jobs.netbrace;
    expect(job.name).toBe('netbrace'); // the check's name, to require
    const checkout = job.steps.find((s) => s.uses?.startsWith('actions/checkout@'));
    expect(checkout?.with?.['fetch-depth']).toBe(0);
    const step = job.steps.find((s) => s.uses?.includes('/netbrace@'))!;
    expect(step.uses).toBe(`acme/netbrace@${SHA}`);
    expect(step.with).toMatchObject({ mode: 'block' });
    const declared = Object.keys(
      (parseYaml(readFileSync(path.join(repoRoot, 'action.yml'), 'utf8')) as { inputs: Record<string, unknown> })
        .inputs,
    );
    for (const k of Object.keys(step.with ?? {})) expect(declared).toContain(k);
    expect(readFileSync(path.join(dir, '.github/CODEOWNERS'), 'utf8')).toContain(
      '/.netbrace.yaml @acme/planning\n/.github/workflows/netbrace.yml @acme/planning\n',
    );
    expect(r.out).toContain('Require status checks to pass');
    expect(r.out).toContain('"netbrace"');
  });

  it('never overwrites a workflow or code-owners file; prints the lines to add instead', async () => {
    const dir = repo();
    mkdirSync(path.join(dir, '.github/workflows'), { recursive: true });
    writeFileSync(path.join(dir, '.github/workflows/netbrace.yml'), 'mine\n');
    writeFileSync(path.join(dir, '.github/CODEOWNERS'), '* @someone\n');
    const r = await init(dir, '--workflow', '--owners', '@acme/planning');
    expect(r.code, r.err).toBe(0);
    expect(readFileSync(path.join(dir, '.github/workflows/netbrace.yml'), 'utf8')).toBe('mine\n');
    expect(readFileSync(path.join(dir, '.github/CODEOWNERS'), 'utf8')).toBe('* @someone\n');
    expect(r.out).toContain('kept .github/CODEOWNERS');
    expect(r.out).toContain('/.netbrace.yaml @acme/planning');
  });

  it('refuses an action reference that is not pinned by commit, and owners that are not owners', async () => {
    const dir = repo();
    expect((await init(dir, '--workflow', '--action', 'acme/netbrace@v1')).code).toBe(2);
    expect((await init(dir, '--workflow', '--owners', 'planning team')).code).toBe(2);
    expect((await init(dir, '--owners', '@acme/planning')).code).toBe(2);
  });

  it('names the policy input only when the policy is not the default one', async () => {
    const dir = repo();
    mkdirSync(path.join(dir, 'ops'));
    expect((await init(dir, '--workflow', '--policy', 'ops/netbrace.yaml')).code).toBe(0);
    const wf = parseYaml(readFileSync(path.join(dir, '.github/workflows/netbrace.yml'), 'utf8')) as Workflow;
    expect(wf.jobs.netbrace.steps.find((s) => s.uses?.includes('/netbrace@'))?.with?.policy).toBe('ops/netbrace.yaml');
  });
});
