// Joining the reports of parts (one job per slice of the changed designs) into the one
// report the final job turns into a summary, a comment and a verdict. Reads reports of this
// and of older versions: fields added since version 1 are optional and filled here.

import { UsageError } from '../errors.js';
import { CAUTION, REPORT_VERSION, type FileReport, type Report } from '../report/report.js';
import { countStatuses, verdictOf } from './verdict.js';

/** Accept a parsed report of this or an older version; UsageError for anything else. */
export function upgradeReport(value: unknown, name = 'report'): Report {
  const r = value as Partial<Report> | null;
  if (r === null || typeof r !== 'object' || typeof r.version !== 'number' || !Array.isArray(r.files)) {
    throw new UsageError(
      `${name} is not a netbrace report`,
      'pass the JSON files written by "netbrace check --json" or the action',
    );
  }
  if (r.version > REPORT_VERSION) {
    throw new UsageError(
      `${name} has report version ${r.version}, newer than this netbrace (${REPORT_VERSION})`,
      'join with the newest netbrace',
    );
  }
  const files = r.files.map((f: FileReport) => ({
    ...f,
    findings: f.findings ?? [],
    requirements: f.requirements ?? [],
  }));
  return {
    ...(r as Report),
    version: REPORT_VERSION,
    files,
    counts: countStatuses(files),
    caution: r.caution ?? CAUTION,
  };
}

export function joinReports(reports: readonly unknown[]): Report {
  if (reports.length === 0) throw new UsageError('there are no reports to join', 'check the folder of part reports');
  const list = reports.map((r, i) => upgradeReport(r, `report ${i + 1}`));
  const split = list.find((r) => r.split?.length);
  if (split) {
    throw new UsageError(
      `${split.split![0].path} was split across the parts by realizations, and a join of reports alone cannot judge it`,
      'join in a checkout with "netbrace check --join", which judges it from the parts\' samples',
    );
  }
  const first = list[0];
  const byPath = new Map<string, FileReport>();
  for (const r of list) for (const f of r.files) if (!byPath.has(f.path)) byPath.set(f.path, f);
  const files = [...byPath.values()].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const joined: Report = {
    version: REPORT_VERSION,
    tool: first.tool,
    verdict: list.some((r) => r.verdict === 'fail') ? 'fail' : verdictOf(files),
    mode: list.some((r) => r.mode === 'block') ? 'block' : 'inform',
    policy: { ...first.policy, ...(list.some((r) => r.policy?.changed) ? { changed: true } : {}) },
    ...(first.base !== undefined ? { base: first.base } : {}),
    ...(first.head !== undefined ? { head: first.head } : {}),
    seed: first.seed,
    ...(first.scope !== undefined ? { scope: first.scope } : {}),
    counts: countStatuses(files),
    files,
    caution: first.caution,
  };
  const parts = list.map((r) => r.part).filter((s): s is NonNullable<Report['part']> => s !== undefined);
  if (parts.length > 0) {
    joined.parts = {
      total: Math.max(...parts.map((s) => s.total)),
      joined: [...new Set(parts.map((s) => s.index))].sort((a, b) => a - b),
    };
  }
  return joined;
}
