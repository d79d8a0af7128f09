// A change that edits the workflow running this step: the settings of this job's netbrace step
// that the head weakens keep the base's value (what the trusted revision said), and the report
// says so.

import { compareSettings, type SettingChange } from '../gate/own-settings.js';
import type { Report } from '../report/report.js';
import type { ActionDeps, Env } from './action-deps.js';
import type { ActionInputs } from './action-inputs.js';

export interface OwnSettings {
  workflow: string;
  changes: SettingChange[];
}

/** The running workflow's path from GITHUB_WORKFLOW_REF (`owner/repo/path@ref`). */
export function workflowPathOf(env: Env): string | undefined {
  const ref = env.GITHUB_WORKFLOW_REF ?? '';
  const at = ref.lastIndexOf('@');
  const full = at > 0 ? ref.slice(0, at) : ref;
  const parts = full.split('/');
  if (parts.length < 3) return undefined;
  const p = parts.slice(2).join('/');
  return /^\.github\/workflows\/[^\0]+\.ya?ml$/.test(p) ? p : undefined;
}

async function showAt(deps: ActionDeps, cwd: string, rev: string, file: string): Promise<string | null> {
  const r = await deps.git(['show', `${rev}:${file}`], cwd);
  return r.code === 0 ? r.stdout : null;
}

/** The settings of this job's netbrace step that the change edits, when it edits its workflow. */
export async function ownSettingChanges(
  deps: ActionDeps,
  env: Env,
  root: string,
  base: string,
  head: string,
): Promise<OwnSettings | undefined> {
  const workflow = workflowPathOf(env);
  if (!workflow) return undefined;
  const [b, h] = [await showAt(deps, root, base, workflow), await showAt(deps, root, head, workflow)];
  if (b === h) return undefined;
  return { workflow, changes: compareSettings(b, h, env.GITHUB_JOB || undefined) };
}

/** Keep the base's value of every setting the head weakens (what the trusted revision said). */
export function applyBaseSettings(inputs: ActionInputs, changes: readonly SettingChange[], deps: ActionDeps): void {
  for (const c of changes) {
    if (!c.weakens) continue;
    const base = c.base === '(unset)' ? '' : c.base;
    if (c.setting === 'mode' && base === 'block') inputs.mode = 'block';
    else if (c.setting === 'policy-source' && base === 'base') inputs.policySource = 'base';
    else if (c.setting === 'policy') inputs.policy = base;
    else if (c.setting === 'org-policy') inputs.orgPolicy = base;
    deps.out.warning(
      `netbrace: this change edits its own workflow: ${c.message}; the base's setting (${c.base}) applies`,
    );
  }
}

export function attachSettings(report: Report, own: OwnSettings, mode: ActionInputs['mode']): void {
  report.configuration = {
    workflow: own.workflow,
    changes: own.changes.map((c) => ({ ...c, severity: c.weakens ? 'fail' : 'notice' })),
  };
  if (own.changes.some((c) => c.weakens)) {
    report.verdict = 'fail';
    report.mode = mode;
  }
}
