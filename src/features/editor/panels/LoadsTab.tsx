import type { StructureResult } from '@/domain/analysis/types';
import type { DesignDocument, LoadCase } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { LoadCaseForm } from './LoadCaseForm';
import { LoadCaseResult } from './LoadCaseResult';
import { StructureCautions } from './StructureCautions';
import { nextLoadCaseId } from './panelCommands';
import type { LoadTargets } from './loadCaseFormSchema';

export interface LoadsTabProps {
  design: DesignDocument;
  structure: StructureResult[];
  selection: string[];
  units: LengthUnit;
  onAddLoadCase: (loadCase: LoadCase) => void;
  onRemoveLoadCase: (loadCaseId: string) => void;
}

export function loadTargetsFor(design: DesignDocument, selection: string[]): LoadTargets {
  const profile = design.profiles.find((candidate) => selection.includes(candidate.id)) ?? null;
  const panel = design.panels.find((candidate) => selection.includes(candidate.id)) ?? null;
  return {
    profile: profile ? { id: profile.id, length: profile.length, label: profile.label } : null,
    panel: panel ? { id: panel.id, label: panel.label } : null,
  };
}

/** Load cases: a form to add one, then each case's sketch and estimates, under standing cautions. */
export function LoadsTab({ design, structure, selection, units, onAddLoadCase, onRemoveLoadCase }: LoadsTabProps) {
  const targets = loadTargetsFor(design, selection);
  const newId = nextLoadCaseId(design);
  const cautionsFromAnalysis = [...new Set(structure.flatMap((result) => result.cautions))];
  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
      <section aria-labelledby="new-load-case" className="flex flex-col gap-2">
        <h3 id="new-load-case" className="text-sm font-semibold">New load case</h3>
        <LoadCaseForm
          key={`${newId}|${targets.profile?.id ?? ''}|${targets.panel?.id ?? ''}|${units}`}
          units={units}
          targets={targets}
          newId={newId}
          defaultName={`Load case ${design.loadCases.length + 1}`}
          onAdd={onAddLoadCase}
        />
      </section>
      <div className="flex min-w-0 flex-col gap-3">
        <StructureCautions extra={cautionsFromAnalysis} settings={design.settings} />
        {design.loadCases.length === 0 ? (
          <p className="text-sm text-ink-muted">No load cases yet. Select a shelf profile or panel, enter the load it carries, and add a case.</p>
        ) : (
          design.loadCases.map((loadCase) => (
            <LoadCaseResult
              key={loadCase.id}
              loadCase={loadCase}
              result={structure.find((result) => result.loadCaseId === loadCase.id)}
              units={units}
              safetyFactor={design.settings.safetyFactor}
              onRemove={() => onRemoveLoadCase(loadCase.id)}
            />
          ))
        )}
      </div>
    </div>
  );
}
