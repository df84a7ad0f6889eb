/** Frame groups: what a regeneration had to take out, so people know and can undo. */
import type { Finding } from '../analysis/types';
import type { AnalysisContext } from '../analysis/context';
import { findingId } from '../analysis/describe';

export function frameGroupFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const group of ctx.design.frameGroups ?? []) {
    group.unfit.forEach((part, index) => {
      out.push({
        id: findingId('frame-group', `unfit-${index}`, [group.id]),
        check: 'frame-group',
        severity: 'warning',
        partIds: group.partIds.slice(0, 1),
        message: `${part.label} no longer fits the resized ${group.name}: ${part.reason}, so it was taken out. Undo brings it back, or add it again where it fits.`,
      });
    });
  }
  return out;
}
