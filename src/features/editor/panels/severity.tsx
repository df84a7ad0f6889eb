import { CircleCheck, CircleX, Info, OctagonAlert, TriangleAlert, type LucideIcon } from 'lucide-react';
import type { Severity } from '@/domain/analysis/types';
import { cn } from '@/lib/cn';

/** Severity is shown as colour + icon + word, never colour alone (look.md). */
export const SEVERITY_META: Record<Severity, { word: string; plural: string; Icon: LucideIcon; text: string; soft: string }> = {
  error: { word: 'Error', plural: 'Errors', Icon: OctagonAlert, text: 'text-severity-error', soft: 'bg-severity-error-soft' },
  warning: { word: 'Warning', plural: 'Warnings', Icon: TriangleAlert, text: 'text-severity-warning', soft: 'bg-severity-warning-soft' },
  note: { word: 'Note', plural: 'Notes', Icon: Info, text: 'text-severity-note', soft: 'bg-severity-note-soft' },
};

export const SEVERITY_ORDER: Severity[] = ['error', 'warning', 'note'];

/** A pass/fail verdict with colour, icon and word. */
export function Verdict({ ok, passWord = 'Passes', failWord = 'Fails' }: { ok: boolean; passWord?: string; failWord?: string }) {
  const Icon = ok ? CircleCheck : CircleX;
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-semibold',
        ok ? 'bg-severity-ok-soft text-severity-ok' : 'bg-severity-error-soft text-severity-error',
      )}
    >
      <Icon aria-hidden="true" className="h-3.5 w-3.5" />
      {ok ? passWord : failWord}
    </span>
  );
}
