// The report as SARIF 2.1.0 for GitHub code scanning: one rule per finding kind (with help
// text), one result per finding at the element's line, and a fingerprint that depends on the
// rule, the file and the elements concerned but not on the line, so that a finding that
// persists across pushes (even when lines above it move) stays the same alert instead of
// closing and reopening. Pure: report in, plain object out (the shell serialises it).

import { oneLine } from './escape.js';
import { stableHash } from '../random.js';
import { findingCost, findingNumbers, repoPath } from './finding-text.js';
import { configurationNotes } from './labels.js';
import { rankFiles, rankFindings } from './rank.js';
import { unreadableFinding } from './story.js';
import { RULE_TITLE } from './vocabulary.js';
import type { Finding, Report, Severity } from './report.js';

export const SARIF_SCHEMA_URI = 'https://json.schemastore.org/sarif-2.1.0.json';
/** GitHub keeps 25,000 results per run (and shows the top 5,000); we rank worst first. */
export const SARIF_MAX_RESULTS = 25_000;

export interface SarifOptions {
  /** Joined before report paths to make them repository-relative (the working directory). */
  pathPrefix?: string;
  /**
   * The fixed code-scanning category (runAutomationDetails.id is "<category>/"). Give each
   * job that uploads its own SARIF its own category, or their alerts replace each other.
   */
  category?: string;
}

type RuleId = Finding['rule'];

interface RuleText {
  name: string;
  /** The help's lead sentence; the rule's short description is its title (vocabulary.ts). */
  short: string;
  full: string;
  help: string;
}

const RULES: Record<RuleId, RuleText> = {
  'r-threshold': {
    name: 'RThreshold',
    short: 'An r-threshold of the policy is not held',
    full: 'At the stated removal fraction, the stated statistic of the robustness envelope (a quantile, the median, the minimum or the worst case) of R is below the threshold the policy requires.',
    help: 'The design does not keep the required level of R when the stated share of elements fails. Add redundancy (a second path, a link to another site) near the elements listed in the weakest removal sequences, then rerun netbrace. The threshold is set in the policy file; it can be tightened by scopes but never loosened below a floor it inherits.',
  },
  'area-floor': {
    name: 'AreaFloor',
    short: 'The envelope area is below its floor',
    full: 'The area of the robustness envelope (the mean over the removal grid of the median R) is below the floor the policy requires.',
    help: 'The design loses robustness too quickly over the whole range of removals. The weakest removal sequences show where; adding links between otherwise distant parts of the network usually raises the area most.',
  },
  'spread-ceiling': {
    name: 'SpreadCeiling',
    short: 'The envelope spread is above its ceiling',
    full: 'The spread of the robustness envelope (the mean width of the band between its quantiles) is above the ceiling the policy allows: the outcome of a failure depends too much on which elements fail.',
    help: 'A wide band means a few elements matter far more than the rest. Look at the weakest removal sequences and give those elements alternatives.',
  },
  'n-1': {
    name: 'NMinusOne',
    short: 'The loss of one element drops R below the N\u22121 floor',
    full: 'Removing the named single element (site or link) drops R below the value the N\u22121 rule of the policy requires.',
    help: 'The named element is critical on its own. Give the traffic it carries an alternative (a parallel link or a second path through other sites), or mark it as hardened in the design if it is engineered not to fail.',
  },
  'new-bridge': {
    name: 'NewBridge',
    short: 'The change adds a bridge (a link whose loss splits the network)',
    full: 'At head, the named link is a bridge: removing it disconnects the network. It was not a bridge at the base, so the change adds a single point of failure.',
    help: 'Restore the redundancy that the change removed (for example the chord that made a ring), or add another link between the two sides the bridge separates.',
  },
  'new-cut-node': {
    name: 'NewCutNode',
    short: 'The change adds a cut site (a site whose loss splits the network)',
    full: 'At head, the named site is a cut node: removing it disconnects the network. It was not one at the base, so the change adds a single point of failure.',
    help: 'Connect the part that hangs off this site to the rest of the network by a second path that avoids it.',
  },
  'new-stranding-group': {
    name: 'NewStrandingGroup',
    short: 'The change adds a shared-risk group whose loss cuts sites off',
    full: 'At head, losing the named shared-risk group (all of its links at once, as in a duct cut) cuts sites off from the rest of the network, through links that are not bridges on their own. The base had no such group, so the change adds a single point of failure that the bridges and cut nodes do not show.',
    help: 'Route one of the links through a different duct or path, or add a link outside the group between the parts it separates.',
  },
  'hardened-weak-point': {
    name: 'HardenedWeakPoint',
    short: 'A weak point the change hides by marking elements hardened',
    full: 'Ignoring the hardened flags, the named element would be a new bridge, cut node or stranding shared-risk group. The change marks it (or its links) hardened, so the challenges never remove it; hardening is a claim in the design file that netbrace cannot verify.',
    help: 'Make sure the element really is engineered not to fail (and reviewed as such), or restore the redundancy instead. The policy key hardened-weak-points sets how this is judged.',
  },
  regression: {
    name: 'Regression',
    short: 'A requirement\u2019s value dropped from base to head beyond tolerance',
    full: 'The paired difference head \u2212 base of a requirement\u2019s value is a drop larger than the tolerance in the policy and larger than its Monte Carlo error.',
    help: 'The change makes the design measurably weaker than the base. The report gives base, head, the delta and its standard error; drops within the Monte Carlo error are never reported as failures.',
  },
  'weakest-sequence': {
    name: 'WeakestSequence',
    short: 'The weakest removal sequence found',
    full: 'The order of element removals that lowered R the most among the evaluated realizations or the worst-case search. Informational.',
    help: 'These elements, in this order, are where the design is weakest under the challenge. They are the first place to add redundancy.',
  },
  'parse-error': {
    name: 'ParseError',
    short: 'The design file could not be read',
    full: 'The design file at head has a syntax or consistency error (for example a link naming an unknown site), so it could not be evaluated. This fails the check.',
    help: 'Fix the file at the line and column given. The other design files were still evaluated.',
  },
  'removed-design': {
    name: 'RemovedDesign',
    short: 'A design file was removed',
    full: 'A design file that exists at the base is deleted at head. It is reported, and fails the check only if the policy says so.',
    help: 'Make sure removing the design is intended; the policy decides whether a removal needs a review.',
  },
  'policy-changed': {
    name: 'PolicyChanged',
    short: 'The change modifies the policy file',
    full: 'The policy file differs between base and head. netbrace applied the base policy, so a change cannot loosen the rules that judge it; the proposed policy applies after the merge.',
    help: 'Have the policy change reviewed on its own merits by the owners of the policy.',
  },
  degraded: {
    name: 'Degraded',
    short: 'The evaluation was reduced to fit its budget',
    full: 'The evaluation of this design was reduced (fewer realizations, sampled sources, a shorter worst-case search) to stay within the configured budgets, so its results carry more uncertainty.',
    help: 'Raise the budgets in the policy, or run netbrace with more threads, for a full evaluation.',
  },
  'not-computable': {
    name: 'NotComputable',
    short: 'A value the check needs could not be computed',
    full: 'R, or a requirement\u2019s value, could not be computed on this design: a metric of R does not apply to it (demand_served on a design without demands, weighted_efficiency without link lengths or latencies), or the value came out NaN or infinite. A value that cannot be computed is never a pass, so this fails the check.',
    help: 'Give the design what the metric needs (the message says what), or define R in the policy with metrics the design supports.',
  },
};

const LEVEL: Record<Severity, 'error' | 'warning' | 'note'> = { fail: 'error', warn: 'warning', notice: 'note' };
const RULE_IDS = Object.keys(RULES) as RuleId[];

/**
 * The stable fingerprint of a finding: rule, repository-relative path, requirement and
 * element ids. Not the line: editing lines above an unchanged finding keeps the same alert.
 */
export function findingFingerprint(path: string, x: Finding): string {
  return stableHash([x.rule, path, x.requirement ?? '', ...x.elements.map((e) => `${e.kind}:${e.id}`)].join('\u0000'));
}

/** The key our finding ids carry under a result's `fingerprints` (versioned, our own). */
export const FINGERPRINT_KEY = 'netbraceFinding/v1';

function instanceOf(report: Report): string {
  return (report.head ?? 'worktree').replace(/[^A-Za-z0-9._-]/g, '-') || 'worktree';
}

function uriOf(path: string): string {
  return path.split('/').map(encodeURIComponent).join('/');
}

function nonEmpty(text: string, fallback: string): string {
  // One line: a line break from an id would forge lines wherever the message is shown.
  const t = oneLine(text).trim();
  return t.length ? t : fallback;
}

export interface SarifLog {
  $schema: string;
  version: '2.1.0';
  runs: unknown[];
}

/** The SARIF log: one run, every rule, results worst first (at most 25,000). */
export function renderSarif(report: Report, options: SarifOptions = {}): SarifLog {
  const category = (options.category ?? 'netbrace').replace(/[^A-Za-z0-9._-]/g, '-') || 'netbrace';
  const rules = RULE_IDS.map((id) => {
    const r = RULES[id];
    return {
      id,
      name: r.name,
      shortDescription: { text: RULE_TITLE[id] },
      fullDescription: { text: r.full },
      help: { text: r.help, markdown: `**${r.short}.** ${r.full}\n\n${r.help}` },
      defaultConfiguration: {
        level:
          id === 'weakest-sequence' || id === 'removed-design' || id === 'policy-changed'
            ? 'note'
            : id === 'degraded' || id === 'hardened-weak-point'
              ? 'warning'
              : 'error',
      },
      properties: { tags: ['robustness', 'network-design'] },
    };
  });
  const results: unknown[] = [];
  const seen = new Map<string, number>();
  let total = 0;
  for (const f of rankFiles(report.files)) {
    const path = repoPath(options.pathPrefix, f.path);
    const findings = rankFindings(f.findings);
    const unread = unreadableFinding(f);
    if (unread) findings.unshift(unread);
    for (const x of findings) {
      total++;
      if (results.length >= SARIF_MAX_RESULTS) continue;
      const base = findingFingerprint(path, x);
      const occurrence = (seen.get(base) ?? 0) + 1;
      seen.set(base, occurrence);
      const region: Record<string, number> = { startLine: Math.max(1, Math.floor(x.line || 1)) };
      if (x.column && x.column > 0) region.startColumn = Math.floor(x.column);
      const properties: Record<string, unknown> = { fileStatus: f.status };
      if (x.requirement) properties.requirement = x.requirement;
      for (const k of ['base', 'head', 'delta', 'se', 'threshold', 'allowance'] as const)
        if (typeof x[k] === 'number') properties[k] = x[k];
      if (x.status) properties.status = x.status;
      if (x.elements.length)
        properties.elements = x.elements.map((e) => ({
          id: e.id,
          kind: e.kind,
          line: e.line,
          ...(e.label !== undefined ? { label: e.label } : {}),
        }));
      if (x.consequence) properties.consequence = x.consequence;
      results.push({
        ruleId: x.rule,
        ruleIndex: RULE_IDS.indexOf(x.rule),
        level: LEVEL[x.severity],
        message: { text: nonEmpty(`${x.message}${findingNumbers(x, 'delta')}${findingCost(x)}`, RULES[x.rule].short) },
        locations: [{ physicalLocation: { artifactLocation: { uri: uriOf(path) }, region } }],
        // Our id is a hash of rule, path, requirement and elements, not of the line's text, so
        // it goes under the standard `fingerprints` with a key of our own; code scanning fills
        // partialFingerprints.primaryLocationLineHash (a hash of the line) itself.
        fingerprints: { [FINGERPRINT_KEY]: `${base}:${occurrence}` },
        properties,
      });
    }
  }
  // The policy change: one sentence on the policy file (a warning when it would loosen it).
  const policyNote = configurationNotes(report).find((n) => n.file === report.policy.path && report.policy.changed);
  if (policyNote && results.length < SARIF_MAX_RESULTS) {
    total++;
    const path = repoPath(options.pathPrefix, policyNote.file);
    const changes = report.policy.changes ?? [];
    const x: Finding = {
      rule: 'policy-changed',
      severity: 'notice',
      message: policyNote.text,
      elements: [],
      line: policyNote.line,
    };
    results.push({
      ruleId: 'policy-changed',
      ruleIndex: RULE_IDS.indexOf('policy-changed'),
      level: changes.some((c) => c.effect === 'loosens') ? 'warning' : 'note',
      message: { text: nonEmpty(`${policyNote.text}.`, RULES['policy-changed'].short) },
      locations: [
        {
          physicalLocation: {
            artifactLocation: { uri: uriOf(path) },
            region: { startLine: Math.max(1, policyNote.line) },
          },
        },
      ],
      fingerprints: { [FINGERPRINT_KEY]: `${findingFingerprint(path, x)}:1` },
      properties: { changes },
    });
  }
  const runProperties: Record<string, unknown> = { verdict: report.verdict, mode: report.mode, seed: report.seed };
  if (total > results.length) runProperties.resultsOmitted = total - results.length;
  return {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: 'netbrace',
            version: report.tool.version,
            semanticVersion: report.tool.version,
            rules,
          },
        },
        // "category/instance" (SARIF 2.1.0 §3.17.4; code scanning reads the category as
        // everything before the last slash): the instance is the head revision judged.
        automationDetails: { id: `${category}/${instanceOf(report)}` },
        results,
        properties: runProperties,
      },
    ],
  };
}
