import type { Decision } from '../api/schemas';

/** Where the review stands for the latest revision. */
export function DecisionBadge({ decision, latestRevision }: { decision: Decision | null; latestRevision: number }) {
  if (!decision) return <p className="text-xs text-ink-muted">Not reviewed yet</p>;
  const current = decision.revision === latestRevision;
  const text = decision.decision === 'approved' ? `Approved revision ${decision.revision}` : `Changes asked on revision ${decision.revision}`;
  return (
    <p className="text-xs text-ink-soft" data-testid="decision-badge">
      {text} by {decision.decidedBy.displayName} on {new Date(decision.decidedAt).toLocaleDateString()}
      {!current && ` · revision ${latestRevision} needs its own review`}
    </p>
  );
}
