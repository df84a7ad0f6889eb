import { TriangleAlert } from 'lucide-react';
import type { InstructionStep } from '@/domain/buildInstructions';
import { LOCAL_RULES } from '@/domain/buildInstructions';

/** What a step needs: parts, hardware, tools and cautions (shared by the step-through and the print view). */
export function StepDetails({ step }: { step: InstructionStep }) {
  return (
    <div className="step-details flex flex-col gap-3 text-base">
      {step.notes ? <p className="text-ink">{step.notes}</p> : null}
      {step.cautions.length > 0 ? (
        <div role="note" className="step-cautions flex gap-2 rounded-lg border border-severity-warning bg-severity-warning-soft px-3 py-2">
          <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
          <div>
            {step.cautions.map((caution) => (
              <p key={caution.kind}>{caution.text}</p>
            ))}
            <p className="text-xs text-ink-soft">{LOCAL_RULES}</p>
          </div>
        </div>
      ) : null}
      {step.parts.length > 0 ? (
        <div>
          <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Parts</h3>
          <ul className="list-disc pl-5">
            {step.parts.map((part) => (
              <li key={part.id}>
                {part.label} <span className="text-xs text-ink-muted">{part.id}</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {step.hardware.length > 0 ? (
        <div>
          <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Fasteners and hardware</h3>
          <ul className="list-disc pl-5">
            {step.hardware.map((line) => (
              <li key={`${line.category}-${line.catalogueId}`}>
                <strong className="tabular-nums">{line.quantity}</strong> × {line.name}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {step.tools.length > 0 ? (
        <div>
          <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Tools</h3>
          <ul className="list-disc pl-5">
            {step.tools.map((tool) => (
              <li key={tool.id}>
                {tool.label} hex key <span className="text-xs text-ink-muted">({tool.standard}; {tool.screws.join(', ')})</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
