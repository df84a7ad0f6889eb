/**
 * Caps on findings lists. A hostile or broken design (2,000 profiles stacked in one place) can
 * produce millions of findings; the list keeps the first `MAX_FINDINGS_PER_CHECK` of each check,
 * most severe first, and one closing finding counts the rest ("…and 1,234 more overlaps").
 */
import type { Finding, Severity } from '../analysis/types';
import { formatNumber } from '../analysis/describe';

/** Parts (profiles + joints + panels + accessories) the editor and, by default, the server analyse at once. */
export const DEFAULT_ANALYSIS_MAX_PARTS = 60_000;
/** Wall time after which an analysis is stopped, ms (the server's default and the editor's worker). */
export const DEFAULT_ANALYSIS_TIME_LIMIT_MS = 5_000;

/** Profiles + joints + panels + accessories of a (possibly unchecked) document. */
export function countDesignParts(document: unknown): number {
  if (typeof document !== 'object' || document === null) return 0;
  let parts = 0;
  for (const key of ['profiles', 'joints', 'panels', 'accessories']) {
    const list = (document as Record<string, unknown>)[key];
    if (Array.isArray(list)) parts += list.length;
  }
  return parts;
}

/** Findings listed per check; the rest are counted, not listed. */
export const MAX_FINDINGS_PER_CHECK = 200;

const NOUNS: Record<string, [string, string]> = {
  interference: ['overlap', 'overlaps'],
  joints: ['joint problem', 'joint problems'],
  'panel-fit': ['panel problem', 'panel problems'],
  structure: ['structural finding', 'structural findings'],
  sequence: ['assembly-order problem', 'assembly-order problems'],
};

/** Beyond this many unlisted findings a check may stop looking and report "at least" this many. */
export const MAX_COUNTED_FINDINGS = 10_000;

/**
 * The closing finding of a capped list: how many more of that check were found and not listed;
 * `atLeast` when the check stopped counting.
 */
export function moreFindingsFinding(check: string, severity: Severity, omitted: number, atLeast = false): Finding {
  const [one, many] = NOUNS[check] ?? ['finding', 'findings'];
  return {
    id: `${check}:more`,
    check,
    severity,
    partIds: [],
    message: `…and ${atLeast ? 'at least ' : ''}${formatNumber(omitted, 0)} more ${omitted === 1 && !atLeast ? one : many} not listed (the list shows the first ${MAX_FINDINGS_PER_CHECK}). Fix the ones above, then check again.`,
    data: atLeast ? { omitted, atLeast } : { omitted },
  };
}

const RANK: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

/**
 * Keeps at most `limit` findings per check (input order kept, so sort first) and closes each
 * capped check with a count of the rest. A check's own closing finding (id `<check>:more`, as the
 * interference check makes when it stops writing messages early) is merged into the count.
 */
export function capFindings(findings: readonly Finding[], limit = MAX_FINDINGS_PER_CHECK): { findings: Finding[]; omitted: number } {
  const kept: Finding[] = [];
  const listed = new Map<string, number>();
  const omittedBy = new Map<string, { count: number; severity: Severity; atLeast: boolean }>();
  const omit = (check: string, severity: Severity, count: number, atLeast = false) => {
    const entry = omittedBy.get(check);
    if (!entry) omittedBy.set(check, { count, severity, atLeast });
    else {
      entry.count += count;
      entry.atLeast ||= atLeast;
      if (RANK[severity] < RANK[entry.severity]) entry.severity = severity;
    }
  };
  for (const finding of findings) {
    if (finding.id === `${finding.check}:more`) {
      omit(finding.check, finding.severity, Number(finding.data?.omitted ?? 0), finding.data?.atLeast === true);
      continue;
    }
    const n = listed.get(finding.check) ?? 0;
    if (n < limit) {
      kept.push(finding);
      listed.set(finding.check, n + 1);
    } else omit(finding.check, finding.severity, 1);
  }
  let omitted = 0;
  for (const [check, { count, severity, atLeast }] of omittedBy) {
    if (count <= 0) continue;
    kept.push(moreFindingsFinding(check, severity, count, atLeast));
    omitted += count;
  }
  return { findings: kept, omitted };
}
