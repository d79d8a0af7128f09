// The gate's own configuration, as a change under review edits it. On a pull request from a
// branch of the same repository the workflow comes from the pull request itself, so a change
// can switch netbrace to inform mode, take the policy from the head, drop the step or let it
// fail quietly. This module compares the netbrace steps of the workflow at the base and at the
// head and says which settings the head weakens; the Action then keeps the base's settings and
// reports each weakening as a failing finding (unless the base already allowed it).
// Pure: the shell reads the two texts.

import { parse as parseYaml } from 'yaml';

/** One setting the change edits. */
export interface SettingChange {
  /** What it is, e.g. `mode`, `policy-source`, `the netbrace step`, `continue-on-error`. */
  setting: string;
  base: string;
  head: string;
  /** True when the head's value judges less strictly than the base's. */
  weakens: boolean;
  /** 1-based line at head (the step, or the line of the setting), or the base's when it is gone. */
  line: number;
  /** One sentence. */
  message: string;
}

export interface StepSettings {
  present: boolean;
  mode: string;
  policySource: string;
  policy: string;
  orgPolicy: string;
  continueOnError: string;
  condition: string;
  line: number;
  lines: Record<string, number>;
}

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Whether a step's `uses` is netbrace (any owner, any pin, or the repository's own `./`). */
export function usesNetbrace(uses: unknown): boolean {
  return typeof uses === 'string' && (/(^|\/)netbrace(@|\/|$)/i.test(uses) || uses === './' || uses === '.');
}

function lineOf(text: string, needle: RegExp, from: number): number {
  const lines = text.split('\n');
  for (let i = Math.max(0, from - 1); i < lines.length; i++) if (needle.test(lines[i])) return i + 1;
  return from;
}

/** The settings of the job's netbrace step (the first, when a job has several). */
export function stepSettings(text: string | null, job: string | undefined): StepSettings {
  const none: StepSettings = {
    present: false,
    mode: '',
    policySource: '',
    policy: '',
    orgPolicy: '',
    continueOnError: '',
    condition: '',
    line: 1,
    lines: {},
  };
  if (text === null) return none;
  let wf: unknown;
  try {
    wf = parseYaml(text, { maxAliasCount: 50 });
  } catch {
    return none;
  }
  if (!isObj(wf) || !isObj(wf.jobs)) return none;
  const jobs = Object.entries(wf.jobs).filter(([id, j]) => isObj(j) && (job === undefined || id === job));
  for (const [id, j] of jobs) {
    const steps = (j as Obj).steps;
    if (!Array.isArray(steps)) continue;
    const step = steps.find((s) => isObj(s) && usesNetbrace(s.uses)) as Obj | undefined;
    if (!step) continue;
    const w = isObj(step.with) ? step.with : {};
    const str = (v: unknown) => (v === undefined || v === null ? '' : String(v));
    const jobLine = lineOf(text, new RegExp(`^\\s{1,}${id.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}:\\s*$`), 1);
    const stepLine = lineOf(text, /uses:\s*\S*netbrace|uses:\s*\.\/?\s*$/i, jobLine);
    const at = (key: string) => lineOf(text, new RegExp(`^\\s*${key}:`), stepLine);
    const jobContinue = str((j as Obj)['continue-on-error']);
    return {
      present: true,
      mode: str(w.mode) || 'block',
      policySource: str(w['policy-source']) || 'base',
      policy: str(w.policy),
      orgPolicy: str(w['org-policy']),
      continueOnError: str(step['continue-on-error']) || jobContinue,
      condition: str(step.if),
      line: stepLine,
      lines: {
        mode: at('mode'),
        'policy-source': at('policy-source'),
        policy: at('policy'),
        'org-policy': at('org-policy'),
        'continue-on-error': at('continue-on-error'),
        if: at('if'),
      },
    };
  }
  return none;
}

/** What the head's workflow changes in the job's netbrace step, weakenings first. */
export function compareSettings(
  baseText: string | null,
  headText: string | null,
  job: string | undefined,
): SettingChange[] {
  const b = stepSettings(baseText, job);
  const h = stepSettings(headText, job);
  if (!b.present && !h.present) return [];
  const out: SettingChange[] = [];
  if (b.present && !h.present) {
    out.push({
      setting: 'the netbrace step',
      base: 'present',
      head: 'removed',
      weakens: true,
      line: 1,
      message: 'the change removes the netbrace step (or its job) from the workflow: the check would no longer run',
    });
    return out;
  }
  if (!b.present)
    return [
      {
        setting: 'the netbrace step',
        base: 'absent',
        head: 'added',
        weakens: false,
        line: h.line,
        message: 'the change adds the netbrace step to the workflow',
      },
    ];
  const add = (setting: string, base: string, head: string, weakens: boolean, why: string) => {
    if (base === head) return;
    out.push({
      setting,
      base: base || '(unset)',
      head: head || '(unset)',
      weakens,
      line: h.lines[setting] ?? h.line,
      message: `${setting} ${base || '(unset)'} → ${head || '(unset)'}: ${why}`,
    });
  };
  add(
    'mode',
    b.mode,
    h.mode,
    b.mode === 'block' && h.mode !== 'block',
    h.mode === 'inform' ? 'the check would report but never fail' : 'how the check ends',
  );
  add(
    'policy-source',
    b.policySource,
    h.policySource,
    b.policySource === 'base' && h.policySource !== 'base',
    'the pull request would choose the rules that judge it',
  );
  add('policy', b.policy, h.policy, true, 'another policy file would judge the change');
  add(
    'org-policy',
    b.orgPolicy,
    h.orgPolicy,
    b.orgPolicy !== '' && h.orgPolicy !== b.orgPolicy,
    h.orgPolicy === '' ? 'the organisation floors would no longer be required' : 'another organisation policy',
  );
  add(
    'continue-on-error',
    b.continueOnError,
    h.continueOnError,
    h.continueOnError !== '' && h.continueOnError !== 'false',
    'a failing check would no longer fail the job',
  );
  add('if', b.condition, h.condition, h.condition !== '', 'the step would run only when the condition holds');
  return out.sort((x, y) => Number(y.weakens) - Number(x.weakens));
}
