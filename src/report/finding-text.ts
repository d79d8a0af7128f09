// Small text helpers the GitHub views share: a finding's numbers in words and the
// repository-relative path of a report path. Pure.

import { consequenceSentence, type ElementStyle } from './labels.js';
import { formatDelta, formatError, formatValue } from './format.js';
import type { Finding } from './report.js';

/**
 * " (base 0.742, head 0.680, Δ −0.062 ± 0.004)" for a finding whose message does not state its
 * numbers, "" otherwise. A judged finding (one with a status) states the numbers that decide, at
 * the digits that decide (its `decimals`), so three decimals beside them would contradict it.
 * Decided on the finding's data, never by reading its message.
 */
export function findingNumbers(x: Finding, deltaWord = '\u0394'): string {
  if (x.status !== undefined) return '';
  const parts: string[] = [];
  if (x.base !== undefined && x.base !== null) parts.push(`base ${formatValue(x.base)}`);
  if (x.head !== undefined && x.head !== null) parts.push(`head ${formatValue(x.head)}`);
  if (x.delta !== undefined && x.delta !== null) {
    const err = formatError(x.se);
    parts.push(`${deltaWord} ${formatDelta(x.delta)}${err ? ` ${err}` : ''}`);
  }
  return parts.length ? ` (${parts.join(', ')})` : '';
}

/** " Losing it cuts off …": what the finding's element costs, or "" when the finding does not say. */
export function findingCost(x: Finding, style: ElementStyle = {}): string {
  return x.consequence ? ` ${consequenceSentence(x.consequence, 'Losing it', style)}` : '';
}

/** `prefix/p` with forward slashes; the prefix is the working directory within the repository. */
export function repoPath(prefix: string | undefined, p: string): string {
  const clean = (prefix ?? '')
    .replace(/\\/g, '/')
    .replace(/^\.(\/|$)/, '')
    .replace(/\/+$/, '');
  return clean ? `${clean}/${p}` : p;
}
