import { useMemo, useState } from 'react';
import { DndContext, KeyboardSensor, PointerSensor, closestCenter, useSensor, useSensors, type DragEndEvent } from '@dnd-kit/core';
import { SortableContext, sortableKeyboardCoordinates, useSortable, verticalListSortingStrategy } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { ChevronDown, ChevronRight, GripVertical, RefreshCw, TriangleAlert } from 'lucide-react';
import type { Finding } from '@/domain/analysis/types';
import { sequenceOf, type SequenceStep } from '@/domain/assembly';
import type { DesignOperation } from '@/domain/design/operations';
import { operationCommand } from '@/features/editor/commands/operationCommand';
import { useEditorStore } from '@/features/editor/store/editorStore';
import { cn } from '@/lib/cn';

const KIND_WORDS: Record<SequenceStep['kind'], string> = { place: 'Place', 'slide-in': 'Slide in', flip: 'Turn over', join: 'Join', finish: 'Finish' };

/**
 * The assembly sequence editor: reorder steps by drag or keyboard (dnd-kit: focus a handle, Space,
 * arrows, Space), merge, split, move parts, words per step, regenerate. Every change is one
 * undoable command wrapping a sequence DesignOperation.
 */
export function SequencePanel() {
  const design = useEditorStore((state) => state.design);
  const analysis = useEditorStore((state) => state.analysis);
  const execute = useEditorStore((state) => state.execute);
  const sequence = useMemo(() => sequenceOf(design), [design]);
  const [checked, setChecked] = useState<string[]>([]);
  const [open, setOpen] = useState<string | null>(null);
  const [confirmRegenerate, setConfirmRegenerate] = useState(false);
  const [announcement, setAnnouncement] = useState('');
  const findings = (analysis?.findings ?? []).filter((f) => f.check === 'sequence');
  const stepIds = sequence.steps.map((s) => s.id);
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 4 } }), useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }));

  const run = (label: string, op: DesignOperation) => execute(operationCommand(label, op));
  // A step is marked when a finding names it (findings name both steps they concern).
  const findingsOf = (step: SequenceStep) => findings.filter((f) => f.message.includes(`step ${step.index + 1} (`));

  const onDragEnd = (event: DragEndEvent) => {
    const { active, over } = event;
    if (!over || active.id === over.id) return;
    const to = stepIds.indexOf(String(over.id));
    const from = stepIds.indexOf(String(active.id));
    if (to < 0 || from < 0) return;
    run(`Move step ${from + 1} to position ${to + 1}`, { type: 'moveStep', payload: { stepId: String(active.id), toIndex: to } });
    setAnnouncement(`Step moved from position ${from + 1} to ${to + 1}.`);
  };

  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="sequence-panel">
      <div className="flex flex-wrap items-center gap-2">
        <p className="text-ink-muted">
          {sequence.steps.length} steps{design.sequenceEdited ? ' · edited' : ' · generated'}
          {sequence.tools.length > 0 ? ` · keys: ${sequence.tools.map((t) => t.label).join(', ')}` : ''}
        </p>
        <button
          type="button"
          disabled={checked.length < 2}
          onClick={() => {
            if (run(`Merge ${checked.length} steps`, { type: 'mergeSteps', payload: { stepIds: stepIds.filter((id) => checked.includes(id)) } })) setChecked([]);
          }}
          className="ml-auto min-h-9 rounded border border-paper-line px-2 hover:bg-paper-sunk disabled:opacity-50 focus-ring"
        >
          Merge checked steps
        </button>
        <button
          type="button"
          onClick={() => (design.sequenceEdited ? setConfirmRegenerate(true) : run('Regenerate the sequence', { type: 'regenerateSequence' }))}
          className="inline-flex min-h-9 items-center gap-1 rounded border border-paper-line px-2 hover:bg-paper-sunk focus-ring"
        >
          <RefreshCw aria-hidden className="size-4" /> Regenerate
        </button>
      </div>
      {confirmRegenerate && (
        <div role="alertdialog" aria-label="Regenerate the sequence" className="rounded border border-severity-warning bg-paper p-2">
          <p>Regenerating replaces your edited order, titles, notes and cautions with a generated sequence. You can undo it.</p>
          <div className="mt-2 flex gap-2">
            <button type="button" className="min-h-9 rounded bg-accent px-3 text-white focus-ring" onClick={() => { run('Regenerate the sequence', { type: 'regenerateSequence' }); setConfirmRegenerate(false); }}>
              Replace my edits
            </button>
            <button type="button" className="min-h-9 rounded border border-paper-line px-3 focus-ring" onClick={() => setConfirmRegenerate(false)}>
              Keep my edits
            </button>
          </div>
        </div>
      )}
      {findings.length > 0 && (
        <ul aria-label="Sequence findings" className="flex flex-col gap-1">
          {findings.map((f) => (
            <SequenceFinding key={f.id} finding={f} onFix={(label, op) => run(label, op)} />
          ))}
        </ul>
      )}
      <p className="sr-only" aria-live="polite">{announcement}</p>
      <DndContext sensors={sensors} collisionDetection={closestCenter} onDragEnd={onDragEnd}>
        <SortableContext items={stepIds} strategy={verticalListSortingStrategy}>
          <ol aria-label="Assembly steps" className="flex flex-col gap-1">
            {sequence.steps.map((step) => (
              <StepRow
                key={step.id}
                step={step}
                count={sequence.steps.length}
                steps={sequence.steps}
                problems={findingsOf(step)}
                checked={checked.includes(step.id)}
                open={open === step.id}
                onCheck={(value) => setChecked((list) => (value ? [...list, step.id] : list.filter((id) => id !== step.id)))}
                onToggle={() => setOpen((id) => (id === step.id ? null : step.id))}
                run={run}
              />
            ))}
          </ol>
        </SortableContext>
      </DndContext>
    </div>
  );
}

function SequenceFinding({ finding, onFix }: { finding: Finding; onFix: (label: string, op: DesignOperation) => void }) {
  return (
    <li className="flex items-start gap-2 rounded border border-severity-error/40 bg-paper p-2" data-testid="sequence-finding">
      <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-severity-error" />
      <span className="flex-1">{finding.message}</span>
      {finding.fix && (
        <button type="button" className="min-h-8 shrink-0 rounded border border-paper-line px-2 hover:bg-paper-sunk focus-ring" onClick={() => onFix(finding.fix!.label, finding.fix!.operation)}>
          {finding.fix.label}
        </button>
      )}
    </li>
  );
}

interface StepRowProps {
  step: SequenceStep;
  count: number;
  steps: SequenceStep[];
  problems: Finding[];
  checked: boolean;
  open: boolean;
  onCheck: (value: boolean) => void;
  onToggle: () => void;
  run: (label: string, op: DesignOperation) => boolean;
}

function StepRow({ step, count, steps, problems, checked, open, onCheck, onToggle, run }: StepRowProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: step.id });
  const number = step.index + 1;
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      className={cn('rounded border border-paper-line bg-paper', isDragging && 'relative z-10 shadow-lg', problems.some((p) => p.severity === 'error') && 'border-severity-error')}
      data-testid="sequence-step"
      data-step-id={step.id}
    >
      <div className="flex items-center gap-2 px-1 py-1">
        <button
          type="button"
          ref={setActivatorNodeRef}
          {...attributes}
          {...listeners}
          aria-label={`Drag step ${number}: ${step.title}`}
          className="cursor-grab touch-none rounded p-1 text-ink-muted hover:bg-paper-sunk focus-ring"
        >
          <GripVertical aria-hidden className="size-4" />
        </button>
        <input type="checkbox" aria-label={`Check step ${number}`} checked={checked} onChange={(e) => onCheck(e.target.checked)} />
        <button type="button" aria-expanded={open} onClick={onToggle} className="flex min-w-0 flex-1 items-center gap-1 text-left focus-ring">
          {open ? <ChevronDown aria-hidden className="size-4 shrink-0" /> : <ChevronRight aria-hidden className="size-4 shrink-0" />}
          <span className="tabular-nums text-ink-muted">{number}.</span>
          <span className="truncate font-medium">{step.title}</span>
        </button>
        <span className="shrink-0 text-xs text-ink-muted">
          {KIND_WORDS[step.kind]} · {step.partIds.length} {step.partIds.length === 1 ? 'part' : 'parts'}
        </span>
        {problems.length > 0 && <TriangleAlert aria-label={`${problems.length} ${problems.length === 1 ? 'problem' : 'problems'}`} className="size-4 shrink-0 text-severity-error" />}
        <button type="button" aria-label={`Move step ${number} up`} disabled={number === 1} onClick={() => run(`Move step ${number} up`, { type: 'moveStep', payload: { stepId: step.id, toIndex: step.index - 1 } })} className="rounded px-1 hover:bg-paper-sunk disabled:opacity-40 focus-ring">
          ↑
        </button>
        <button type="button" aria-label={`Move step ${number} down`} disabled={number === count} onClick={() => run(`Move step ${number} down`, { type: 'moveStep', payload: { stepId: step.id, toIndex: step.index + 1 } })} className="rounded px-1 hover:bg-paper-sunk disabled:opacity-40 focus-ring">
          ↓
        </button>
      </div>
      {open && <StepEditor step={step} steps={steps} run={run} />}
    </li>
  );
}

function StepEditor({ step, steps, run }: { step: SequenceStep; steps: SequenceStep[]; run: (label: string, op: DesignOperation) => boolean }) {
  const [parts, setParts] = useState<string[]>([]);
  const [target, setTarget] = useState('');
  const number = step.index + 1;
  const words = (field: 'title' | 'notes' | 'caution', value: string) => {
    if ((step[field] ?? '') === value) return;
    run(`Change the ${field} of step ${number}`, { type: 'updateStep', payload: { stepId: step.id, changes: { [field]: value } } });
  };
  return (
    <div className="flex flex-col gap-2 border-t border-paper-line p-2">
      <label className="flex flex-col gap-1">
        <span className="text-xs font-semibold">Title</span>
        <input defaultValue={step.title} maxLength={120} onBlur={(e) => words('title', e.target.value)} className="rounded border border-paper-line px-2 py-1" />
      </label>
      <label className="flex flex-col gap-1">
        <span className="text-xs font-semibold">Notes</span>
        <textarea defaultValue={step.notes ?? ''} maxLength={2000} rows={2} onBlur={(e) => words('notes', e.target.value)} className="rounded border border-paper-line px-2 py-1" />
      </label>
      <label className="flex flex-col gap-1">
        <span className="text-xs font-semibold">Caution</span>
        <input defaultValue={step.caution ?? ''} maxLength={500} onBlur={(e) => words('caution', e.target.value)} className="rounded border border-paper-line px-2 py-1" />
      </label>
      {step.cautions.length > 0 && (
        <ul aria-label="Cautions" className="text-xs text-ink-muted">
          {step.cautions.map((c) => (
            <li key={c.kind}>⚠ {c.message} ({c.basis})</li>
          ))}
        </ul>
      )}
      {step.tools.length > 0 && <p className="text-xs text-ink-muted">Hex keys: {step.tools.map((t) => `${t.label} (${t.standard})`).join(', ')}</p>}
      <fieldset className="flex flex-col gap-1">
        <legend className="text-xs font-semibold">Parts</legend>
        <div className="flex max-h-32 flex-wrap gap-x-3 gap-y-1 overflow-y-auto">
          {step.partIds.map((id) => (
            <label key={id} className="inline-flex items-center gap-1 text-xs">
              <input type="checkbox" checked={parts.includes(id)} onChange={(e) => setParts((list) => (e.target.checked ? [...list, id] : list.filter((x) => x !== id)))} />
              {id}
            </label>
          ))}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <button
            type="button"
            disabled={parts.length === 0 || parts.length === step.partIds.length}
            onClick={() => run(`Split step ${number}`, { type: 'splitStep', payload: { stepId: step.id, partIds: parts } }) && setParts([])}
            className="min-h-8 rounded border border-paper-line px-2 hover:bg-paper-sunk disabled:opacity-50 focus-ring"
          >
            Split checked parts into a new step
          </button>
          <label className="inline-flex items-center gap-1 text-xs">
            Move checked parts to
            <select value={target} onChange={(e) => setTarget(e.target.value)} className="rounded border border-paper-line px-1 py-0.5">
              <option value="">step…</option>
              {steps.filter((s) => s.id !== step.id).map((s) => (
                <option key={s.id} value={s.id}>
                  {s.index + 1}. {s.title}
                </option>
              ))}
            </select>
          </label>
          <button
            type="button"
            disabled={parts.length === 0 || !target}
            onClick={() => run(`Move ${parts.length} ${parts.length === 1 ? 'part' : 'parts'} to another step`, { type: 'movePartsToStep', payload: { partIds: parts, stepId: target } }) && setParts([])}
            className="min-h-8 rounded border border-paper-line px-2 hover:bg-paper-sunk disabled:opacity-50 focus-ring"
          >
            Move
          </button>
        </div>
      </fieldset>
    </div>
  );
}
