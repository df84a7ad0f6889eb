import { useCallback, useMemo, useState } from 'react';
import { useParams } from 'react-router';
import { Printer } from 'lucide-react';
import { Button, ErrorNotice, PageSkeleton } from '@/components/ui';
import { LOCAL_RULES } from '@/domain/buildInstructions';
import { formatLength, formatMass } from '@/domain/units';
import { DesignViewer, StepPictures, type StepPicture } from '@/components/viewer';
import type { SequenceStep } from '@/domain/assembly';
import type { DesignDocument } from '@/domain/design/schema';
import { useBuildData } from '../hooks/useBuildData';
import { StepDetails } from './StepDetails';
import './print.css';

/** Printable instructions: a cover (size, mass, BOM, tools, cut list, cautions), then one block per step. */
export default function PrintInstructionsPage() {
  const buildId = Number(useParams().buildId);
  const data = useBuildData(buildId);
  const [pictures, setPictures] = useState<string[]>([]);
  const [rendered, setRendered] = useState(false);
  const onPicture = useCallback((picture: StepPicture) => {
    setPictures((current) => {
      const next = [...current];
      next[picture.index] = picture.dataUrl;
      return next;
    });
  }, []);
  const onDone = useCallback(() => setRendered(true), []);

  if (data.build.isError) return <ErrorNotice title="This build could not be opened" message={data.build.error.message} />;
  if (!data.detail || !data.design || !data.analysis || !data.steps || !data.cautions) return <PageSkeleton label="Preparing the instructions" />;
  const { build } = data.detail;
  const { design, analysis, steps, cautions } = data;
  const units = design.units;
  const size = analysis.mass.overallSize;

  return (
    <main className="print-document mx-auto max-w-[60rem] bg-white p-6 text-ink">
      <div className="no-print mb-4 flex items-center justify-end gap-3">
        <p className="text-sm text-ink-soft" aria-live="polite" data-testid="step-pictures-status">
          {rendered ? `${steps.length} step pictures ready` : `Rendering step pictures ${pictures.filter(Boolean).length}/${steps.length}`}
        </p>
        <Button variant="primary" icon={<Printer aria-hidden className="size-4" />} disabled={!rendered} onClick={() => window.print()}>
          Print
        </Button>
      </div>
      {!rendered && data.sequence ? <PictureRenderer design={design} steps={data.sequence.steps} onPicture={onPicture} onDone={onDone} /> : null}
      <section className="print-cover" data-testid="print-cover">
        <h1 className="text-3xl font-semibold">{design.name}</h1>
        <p className="text-ink-soft">
          Assembly instructions · build {build.id} · revision {build.revision}
          {build.dueDate ? ` · due ${build.dueDate}` : ''}
        </p>
        <dl className="mt-4 grid grid-cols-2 gap-2">
          <dt className="font-semibold">Overall size (W × H × D)</dt>
          <dd>
            {formatLength(size.x, units)} × {formatLength(size.y, units)} × {formatLength(size.z, units)}
          </dd>
          <dt className="font-semibold">Mass</dt>
          <dd>{formatMass(analysis.mass.total, units)}</dd>
        </dl>
        {cautions.length > 0 ? (
          <div className="print-cautions mt-4 rounded border-2 border-severity-warning p-3">
            <h2 className="text-lg font-semibold">Cautions</h2>
            <ul className="list-disc pl-5">
              {cautions.map((caution) => (
                <li key={caution.kind}>{caution.text}</li>
              ))}
            </ul>
            <p className="text-sm">{LOCAL_RULES}</p>
          </div>
        ) : null}
        <h2 className="mt-4 text-lg font-semibold">Bill of materials</h2>
        <table className="print-table">
          <thead>
            <tr><th>Qty</th><th>Unit</th><th>Description</th><th>Code</th></tr>
          </thead>
          <tbody>
            {analysis.bom.map((line) => (
              <tr key={`${line.code}-${line.description}`}>
                <td>{line.quantity}</td><td>{line.unit}</td><td>{line.description}</td><td>{line.code}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <h2 className="mt-4 text-lg font-semibold">Tools</h2>
        <ul className="list-disc pl-5">
          {analysis.tools.map((tool) => (
            <li key={tool.id}>
              {tool.name}
              {tool.standard ? ` (${tool.standard})` : ''} — {tool.reason}
            </li>
          ))}
        </ul>
        <h2 className="mt-4 text-lg font-semibold">Cut list</h2>
        <table className="print-table">
          <thead>
            <tr><th>Qty</th><th>Length</th><th>Profile</th><th>Ends and machining</th><th>Pieces</th></tr>
          </thead>
          <tbody>
            {analysis.cutGroups.map((group) => (
              <tr key={group.groupKey}>
                <td>{group.quantity}</td>
                <td>{formatLength(group.length, units)}</td>
                <td>{group.variantId}</td>
                <td>{[group.ends.start, group.ends.end].filter((end) => end.kind !== 'plain').map((end) => end.description).concat(group.machining.filter((op) => op.kind !== 'end-tap').map((op) => op.description)).join('; ') || 'Plain'}</td>
                <td>{group.profileIds.join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      {steps.map((step, index) => (
        <section key={step.id} className="print-step" data-testid="print-step">
          <h2 className="text-xl font-semibold">
            Step {step.number} of {steps.length}: {step.title}
          </h2>
          {pictures[index] ? (
            <img src={pictures[index]} alt={`Step ${step.number}: ${step.title}`} className="print-picture my-2 w-full max-w-[36rem] border border-paper-line" />
          ) : (
            <div className="print-picture my-2 flex aspect-[10/7] w-full max-w-[36rem] items-center justify-center border border-paper-line text-sm text-ink-muted">Rendering the picture…</div>
          )}
          <StepDetails step={step} />
        </section>
      ))}
    </main>
  );
}

/**
 * The shared 3D viewer, off screen at a fixed size, rendering one picture per step with the
 * exploded-view player (see StepPictures); unmounted once every picture is made.
 */
function PictureRenderer({ design, steps, onPicture, onDone }: { design: DesignDocument; steps: readonly SequenceStep[]; onPicture: (picture: StepPicture) => void; onDone: () => void }) {
  const display = useMemo(() => ({ units: design.units, findingMarkers: false, grid: false }), [design.units]);
  return (
    <div aria-hidden className="no-print" style={{ position: 'fixed', left: -10_000, top: 0, width: 800, height: 560 }}>
      <DesignViewer design={design} display={display} viewPlan={false} testId="step-picture-renderer">
        <StepPictures steps={steps} onPicture={onPicture} onDone={onDone} />
      </DesignViewer>
    </div>
  );
}
