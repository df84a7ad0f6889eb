import { useId, useState } from 'react';
import { ChevronDown, ChevronUp, LoaderCircle, TriangleAlert } from 'lucide-react';
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument, LoadCase } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { useEditorStore } from '@/features/editor/store/editorStore';
import { cn } from '@/lib/cn';
import { BarsTab, CutsTab, PartsTab, PriceTab, ToolsTab, WeightTab } from '@/components/outputs';
import { DockTabs, type DockTab } from './DockTabs';
import { LoadsTab } from './LoadsTab';
import { StockSettingsForm } from './StockSettingsForm';
import { SequencePanel } from '../sequence/SequencePanel';
import { addLoadCaseCommand, removeLoadCaseCommand, updateSettingsCommand, type StockSettingsPatch } from './panelCommands';

export const OUTPUT_TABS: DockTab[] = [
  { id: 'parts', label: 'Parts' },
  { id: 'cuts', label: 'Cuts' },
  { id: 'bars', label: 'Bars' },
  { id: 'tools', label: 'Tools' },
  { id: 'weight', label: 'Weight' },
  { id: 'price', label: 'Price' },
  { id: 'loads', label: 'Loads' },
  { id: 'sequence', label: 'Sequence' },
];

export type OutputTabId = 'parts' | 'cuts' | 'bars' | 'tools' | 'weight' | 'price' | 'loads' | 'sequence';

export function isEmptyDesign(design: DesignDocument): boolean {
  return design.profiles.length === 0 && design.panels.length === 0 && design.accessories.length === 0;
}

/** The collapsible outputs dock under the model: parts, cuts, bars, tools, weight, price and loads. */
export function OutputsDock({
  initialTab = 'parts',
  defaultOpen = true,
  collapsible = true,
}: {
  initialTab?: OutputTabId;
  defaultOpen?: boolean;
  /** False when the surrounding layout already folds the dock away. */
  collapsible?: boolean;
}) {
  const design = useEditorStore((state) => state.design);
  const analysis = useEditorStore((state) => state.analysis);
  const analysedDesign = useEditorStore((state) => state.analysedDesign);
  const status = useEditorStore((state) => state.analysisStatus);
  const units = useEditorStore((state) => state.units);
  const selection = useEditorStore((state) => state.selection);
  const execute = useEditorStore((state) => state.execute);
  const select = useEditorStore((state) => state.select);
  const [openState, setOpen] = useState(defaultOpen);
  const open = openState || !collapsible;
  const [active, setActive] = useState<string>(initialTab);
  const idPrefix = `outputs-${useId().replace(/:/g, '')}`;
  const running = status === 'running';

  return (
    <section aria-label="Outputs" className="flex h-full min-h-0 flex-col bg-paper-raised">
      <div className="flex items-center gap-2 border-b border-paper-line px-2">
        {collapsible && (
          <button
            type="button"
            aria-expanded={open}
            aria-controls={`${idPrefix}-body`}
            onClick={() => setOpen((value) => !value)}
            className="inline-flex min-h-[44px] items-center gap-1 rounded px-2 text-sm font-semibold focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
          >
            {open ? <ChevronDown aria-hidden="true" className="h-4 w-4" /> : <ChevronUp aria-hidden="true" className="h-4 w-4" />}
            Outputs
            <span className="sr-only">{open ? ' (collapse)' : ' (expand)'}</span>
          </button>
        )}
        {open && <DockTabs tabs={OUTPUT_TABS} active={active} onChange={setActive} idPrefix={idPrefix} label="Outputs" />}
        <span role="status" aria-live="polite" className="ml-auto flex items-center gap-1 text-xs text-ink-muted">
          {running && (
            <>
              <LoaderCircle aria-hidden="true" className="h-4 w-4 animate-spin text-accent" />
              Updating…
            </>
          )}
          {status === 'error' && (
            <span className="flex items-center gap-1 text-severity-error">
              <TriangleAlert aria-hidden="true" className="h-4 w-4" />
              Error: the analysis failed{analysis ? '; showing the last result' : ''}.
            </span>
          )}
        </span>
      </div>
      {open && (
        <div
          id={`${idPrefix}-body`}
          className="min-h-0 flex-1 overflow-auto px-3 pb-3"
        >
          <div
            role="tabpanel"
            id={`${idPrefix}-panel-${active}`}
            aria-labelledby={`${idPrefix}-tab-${active}`}
            aria-busy={running}
            tabIndex={0}
            className={cn('pt-2 transition-opacity focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent', running && analysis && 'opacity-60')}
          >
            <DockBody
              tab={active}
              design={design}
              analysis={analysis}
              analysedSettings={analysedDesign?.settings ?? design.settings}
              running={running}
              units={units}
              selection={selection}
              onApplySettings={(patch: StockSettingsPatch) => execute(updateSettingsCommand('Change stock settings', patch))}
              onAddLoadCase={(loadCase: LoadCase) => execute(addLoadCaseCommand(loadCase))}
              onRemoveLoadCase={(id: string) => execute(removeLoadCaseCommand(id))}
              onSelectParts={select}
            />
          </div>
        </div>
      )}
    </section>
  );
}

interface DockBodyProps {
  tab: string;
  design: DesignDocument;
  analysis: DesignAnalysis | null;
  /** Settings the shown analysis was computed with (the bars are drawn with these). */
  analysedSettings: DesignDocument['settings'];
  running: boolean;
  units: LengthUnit;
  selection: string[];
  onApplySettings: (patch: StockSettingsPatch) => void;
  onAddLoadCase: (loadCase: LoadCase) => void;
  onRemoveLoadCase: (id: string) => void;
  /** Rows of the parts and cuts tables select their parts in the model. */
  onSelectParts?: (ids: string[], mode: 'replace' | 'add') => void;
}

/** One tab's content, or the empty / first-run states. */
export function DockBody({ tab, design, analysis, analysedSettings, running, units, selection, onApplySettings, onAddLoadCase, onRemoveLoadCase, onSelectParts }: DockBodyProps) {
  const selectedIds = new Set(selection);
  if (isEmptyDesign(design)) {
    return (
      <div className="py-6 text-center text-sm text-ink-muted">
        <p className="font-semibold text-ink">Nothing to list yet.</p>
        <p>Draw a profile or start from a generator: parts, cuts, bars, tools, weight and price appear here as you build.</p>
      </div>
    );
  }
  if (!analysis) {
    return (
      <p className="flex items-center gap-2 py-6 text-sm text-ink-muted">
        {running && <LoaderCircle aria-hidden="true" className="h-4 w-4 animate-spin text-accent" />}
        {running ? 'Working out the outputs…' : 'Outputs appear once the design has been checked.'}
      </p>
    );
  }
  if (tab === 'sequence') return <SequencePanel />;
  switch (tab) {
    case 'parts':
      return <PartsTab lines={analysis.bom} units={units} designName={design.name} selectedIds={selectedIds} onSelectParts={onSelectParts} />;
    case 'cuts':
      return <CutsTab groups={analysis.cutGroups} items={analysis.cutList} units={units} designName={design.name} selectedIds={selectedIds} onSelectParts={onSelectParts} />;
    case 'bars':
      return (
        <BarsTab
          stockPlans={analysis.stockPlans}
          settings={design.settings}
          pictureSettings={analysedSettings}
          units={units}
          settingsSlot={
            <StockSettingsForm
              key={`${design.settings.stockLength}|${design.settings.kerf}|${design.settings.endTrim}|${design.settings.minReusableOffcut}|${units}`}
              settings={design.settings}
              units={units}
              onApply={onApplySettings}
            />
          }
        />
      );
    case 'tools':
      return <ToolsTab tools={analysis.tools} />;
    case 'weight':
      return <WeightTab mass={analysis.mass} design={design} units={units} />;
    case 'price':
      return <PriceTab cost={analysis.cost} units={units} />;
    case 'loads':
      return (
        <LoadsTab
          design={design}
          structure={analysis.structure}
          selection={selection}
          units={units}
          onAddLoadCase={onAddLoadCase}
          onRemoveLoadCase={onRemoveLoadCase}
        />
      );
    default:
      return null;
  }
}
