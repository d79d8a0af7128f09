// Joining part reports: a join job reads the reports its parts uploaded (untrusted files:
// size-checked, parsed as data, shape-checked by the join) and checks that every part is there.

import { lstatSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { isNetbraceError } from '../errors.js';
import type { Report } from '../report/report.js';
import { upgradeReport } from '../gate/join.js';
import { joinInput, type JoinInput } from '../gate/split.js';
import type { ActionDeps } from './action-deps.js';
import { InputError } from './action-inputs.js';

const MAX_REPORT_BYTES = 64 * 1024 * 1024;

/** The part reports in `folder` (and up to three levels below), parsed as data, not yet checked. */
export function readPartReports(folder: string): { reports: unknown[]; names: string[] } {
  const names: string[] = [];
  const walk = (dir: string, depth: number) => {
    for (const entry of readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const full = path.join(dir, entry.name);
      if (entry.isSymbolicLink()) continue; // never follow links out of the folder
      if (entry.isDirectory() && depth < 3) walk(full, depth + 1);
      else if (entry.isFile() && entry.name.endsWith('.json')) names.push(full);
    }
  };
  walk(folder, 0);
  const reports: unknown[] = [];
  for (const file of names) {
    const stat = lstatSync(file);
    if (stat.size > MAX_REPORT_BYTES) throw new InputError(`part report ${path.basename(file)} is larger than 64 MiB`);
    let parsed: unknown;
    try {
      parsed = JSON.parse(readFileSync(file, 'utf8'));
    } catch {
      throw new InputError(`part report ${path.basename(file)} is not valid JSON`);
    }
    reports.push(parsed);
  }
  if (!reports.length)
    throw new InputError(
      `input "join-parts": no part report (*.json) in ${path.basename(folder)}; download the parts' artifacts there first`,
    );
  return { reports, names };
}

/** The joined report, or why the step fails (a part is missing). */
export function joinPartReports(
  deps: ActionDeps,
  folder: string,
  given: string,
  notes: string[],
): { report: Report } | { failure: string } {
  const { reports, names } = readPartReports(folder);
  deps.out.info(`netbrace: joining ${reports.length} part reports`);
  let report: Report;
  try {
    report = deps.join(reports);
  } catch (error) {
    // Name the file: the join numbers reports in the order they were read.
    const m = /^report (\d+)/.exec(error instanceof Error ? error.message : '');
    if (m && isNetbraceError(error))
      throw new InputError(
        `part report ${path.basename(names[Number(m[1]) - 1] ?? '?')}: ${error.message.replace(/^report \d+ /, '')}`,
      );
    throw error;
  }
  // The report keeps the mode its runs had (what the comment says); whether this step
  // fails follows this job's own "mode" input.
  const joined = report.parts;
  if (joined) {
    const missing = Array.from({ length: joined.total }, (_, i) => i + 1).filter((k) => !joined.joined.includes(k));
    if (missing.length) {
      return {
        failure: `netbrace: part report${missing.length === 1 ? '' : 's'} ${missing.map((k) => `${k}/${joined.total}`).join(', ')} missing from ${given}: every part must upload its report before the join job runs (needs: the part job)`,
      };
    }
  }
  notes.push(`Joined from ${names.length} part report${names.length === 1 ? '' : 's'}.`);
  return { report };
}

/**
 * When a part report holds a design split across the parts by realizations, the join judges
 * that design itself (in the checkout, from the parts' samples: gate/split.ts), so the join job
 * runs the gate with this input; undefined when every design was judged whole.
 */
export function splitJoinInput(folder: string): JoinInput | undefined {
  const { reports, names } = readPartReports(folder);
  // Any other report (a broken one included) is left to joinPartReports, which names its problem.
  if (!reports.some((r) => r !== null && typeof r === 'object' && Array.isArray((r as { split?: unknown }).split)))
    return undefined;
  const checked = reports.map((r, i) => upgradeReport(r, `part report ${path.basename(names[i])}`));
  return checked.some((r) => r.split?.length) ? joinInput(checked) : undefined;
}
