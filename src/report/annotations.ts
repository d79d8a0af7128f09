// The report as workflow annotations: one per finding, on the design file at the line of the
// element concerned. GitHub keeps at most 10 errors, 10 warnings and 10 notices per step and
// drops the rest silently, so the list is ranked (severity, then whether the line is one the
// change touched, since only those show inline in "Files changed") and cut to the budget,
// and a last notice says how many more there are and where. Pure: the shell turns the list
// into @actions/core calls.

import { logText, oneLine } from './escape.js';
import { findingCost, findingNumbers, repoPath } from './finding-text.js';
import { configurationNotes, findingTitle } from './labels.js';
import { unreadableFinding } from './story.js';
import { RULE_TITLE } from './vocabulary.js';
import { SEVERITY_RANK, rankFiles } from './rank.js';
import type { Finding, Report, Severity } from './report.js';

export type AnnotationLevel = 'error' | 'warning' | 'notice';

export interface Annotation {
  level: AnnotationLevel;
  /** Repository-relative path with forward slashes. */
  file: string;
  startLine: number;
  startColumn?: number;
  title: string;
  message: string;
  /** The finding kind; "more" for the closing notice about findings left out. */
  rule: Finding['rule'] | 'more' | 'own-settings';
  /** Whether the line is one the change touched (annotations show inline only there). */
  inDiff: boolean;
}

export interface AnnotationOptions {
  /** Annotations per level per step; GitHub keeps 10. */
  perLevel?: number;
  /** Joined before report paths to make them repository-relative (the working directory). */
  pathPrefix?: string;
  /** Lines touched at head per repository-relative path; a path not in the map: unknown. */
  changedLines?: ReadonlyMap<string, ReadonlySet<number>>;
  /** Where the rest can be read, for the closing notice. */
  elsewhere?: string;
  /** Error slots kept free for the step's own failure message (core.setFailed is an error
   *  annotation too: with 10 finding errors beside it GitHub dropped one). */
  reservedErrors?: number;
}

export interface AnnotationPlan {
  /** What to emit, in order (the closing notice, if any, is last). */
  annotations: Annotation[];
  /** Findings that did not fit the budget. */
  omitted: number;
  /** Findings in the report. */
  total: number;
}

export const ANNOTATIONS_PER_LEVEL = 10;

const LEVEL: Record<Severity, AnnotationLevel> = { fail: 'error', warn: 'warning', notice: 'notice' };

/** Every finding as an annotation, ranked, before the budget is applied. */
export function annotationsOf(report: Report, options: AnnotationOptions = {}): Annotation[] {
  const out: Annotation[] = [];
  for (const f of rankFiles(report.files)) {
    const file = repoPath(options.pathPrefix, f.path);
    const touched = options.changedLines?.get(file);
    const findings = [...f.findings];
    const unread = unreadableFinding(f);
    if (unread) findings.push(unread);
    for (const x of findings) {
      const startLine = Math.max(1, Math.floor(x.line || 1));
      out.push({
        level: LEVEL[x.severity],
        file,
        startLine,
        ...(x.column && x.column > 0 ? { startColumn: Math.floor(x.column) } : {}),
        title: oneLine(`netbrace: ${findingTitle(x, RULE_TITLE)}`, 200),
        message: logText(`${x.message}${findingNumbers(x)}${findingCost(x)}`),
        rule: x.rule,
        inDiff: touched ? touched.has(startLine) : false,
      });
    }
  }
  // The gate's own configuration, edited by the change: on the workflow and the policy files.
  // The policy's note is one sentence (story.ts); a change that would loosen it is a warning.
  const loosens = report.policy.changes?.some((c) => c.effect === 'loosens') ?? false;
  for (const n of configurationNotes(report)) {
    const file = repoPath(options.pathPrefix, n.file);
    const startLine = Math.max(1, n.line);
    const policy = n.file === report.policy.path;
    out.push({
      level: n.weakens ? 'error' : policy && loosens ? 'warning' : 'notice',
      file,
      startLine,
      title: n.weakens
        ? 'netbrace: the change weakens netbrace\u2019s own settings'
        : policy
          ? `netbrace: ${RULE_TITLE['policy-changed']}`
          : 'netbrace: the change edits netbrace\u2019s workflow',
      message: logText(policy ? `${n.text}.` : n.text),
      rule: policy ? 'policy-changed' : 'own-settings',
      inDiff: options.changedLines?.get(file)?.has(startLine) ?? false,
    });
  }
  const rank = (a: Annotation) =>
    SEVERITY_RANK[a.level === 'error' ? 'fail' : a.level === 'warning' ? 'warn' : 'notice'];
  // Stable sort: within a severity, touched lines first, then the files' worst-first order.
  return out.sort((a, b) => rank(a) - rank(b) || Number(b.inDiff) - Number(a.inDiff));
}

/** The annotations to emit within GitHub's per-step budget, and a closing notice for the rest. */
export function planAnnotations(report: Report, options: AnnotationOptions = {}): AnnotationPlan {
  const perLevel = options.perLevel ?? ANNOTATIONS_PER_LEVEL;
  const all = annotationsOf(report, options);
  const taken: Annotation[] = [];
  const used: Record<AnnotationLevel, number> = { error: 0, warning: 0, notice: 0 };
  // If anything is left out, the last notice slot is the closing notice.
  const errorCap = Math.max(0, perLevel - (options.reservedErrors ?? 0));
  const capOf = (l: AnnotationLevel) => (l === 'error' ? errorCap : perLevel);
  const fitsAll = (['error', 'warning', 'notice'] as AnnotationLevel[]).every(
    (l) => all.filter((a) => a.level === l).length <= capOf(l),
  );
  const cap: Record<AnnotationLevel, number> = {
    error: errorCap,
    warning: perLevel,
    notice: fitsAll ? perLevel : perLevel - 1,
  };
  for (const a of all) {
    if (used[a.level] < cap[a.level]) {
      taken.push(a);
      used[a.level]++;
    }
  }
  const omitted = all.length - taken.length;
  if (omitted > 0) {
    const elsewhere = options.elsewhere ?? 'the job summary and the SARIF file';
    taken.push({
      level: 'notice',
      file: '',
      startLine: 0,
      title: 'netbrace: more findings',
      message: logText(
        `${omitted} more finding${omitted === 1 ? '' : 's'} (of ${all.length}) not annotated here: GitHub shows at most ${perLevel} annotations per level and step. All of them are in ${elsewhere}.`,
      ),
      rule: 'more',
      inDiff: false,
    });
  }
  return { annotations: taken, omitted, total: all.length };
}
