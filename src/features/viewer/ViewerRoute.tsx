import { memo, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { Link, useParams } from 'react-router';
import { Eye, EyeOff } from 'lucide-react';
import { PartsTab, ToolsTab } from '@/components/outputs';
import { ErrorNotice, PageSkeleton } from '@/components/ui';
import { DesignViewer, StepList, StepPlayerControls, StepPlayerScene, stepsFromDesign, usePlayerKeys, useStepPlayer, type CameraRequest, type PlayerView, type StepPlayerState } from '@/components/viewer';
import type { DesignAnalysis } from '@/domain/analysis/types';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { defaultCatalogue } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';
import { isApiError } from '@/lib/apiClient';
import { useViewerDesign } from './api/getViewerDesign';
import { ViewerSheet } from './components/ViewerSheet';

/**
 * /designs/:designId/view — the read-only viewer: orbit, zoom, panels hidden or shown, the
 * exploded-view player and the bill of materials. A lazy chunk of its own that carries the shared
 * viewer layer and none of the editor's code. Phones and tablets get a pull-up sheet.
 */
export default function ViewerRoute() {
  const { designId: param } = useParams();
  const designId = Number(param);
  const valid = Number.isInteger(designId) && designId > 0;
  const query = useViewerDesign(valid ? designId : 0);

  if (!valid) return <ViewerProblem message="This address does not name a design." />;
  if (query.isPending) return <PageSkeleton />;
  if (query.isError) {
    const error = query.error;
    const message = isApiError(error) && error.status === 404 ? 'This design does not exist, or it was deleted.' : isApiError(error) ? error.message : 'The design could not be opened.';
    return <ViewerProblem message={message} />;
  }
  return <ViewerSession key={designId} designId={designId} name={query.data.design.name} design={query.data.revision.document} />;
}

function ViewerSession({ designId, name, design }: { designId: number; name: string; design: DesignDocument }) {
  const steps = useMemo(() => stepsFromDesign(design), [design]);
  const player = useStepPlayer(steps);
  usePlayerKeys(player);
  const [panels, setPanels] = useState(true);
  const [tab, setTab] = useState<'steps' | 'parts' | 'tools'>('steps');
  const analysis = useDeferredAnalysis(design);

  const page = useFillWindowBelow();
  const sidePanel = <ViewerTabs tab={tab} onTab={setTab} player={player} analysis={analysis} design={design} />;
  return (
    <div ref={page} className="flex h-dvh min-h-0 w-full min-w-0 flex-col overflow-hidden lg:flex-row" data-testid="viewer-page">
      <div className="relative min-h-0 min-w-0 flex-1">
        <ViewerCanvas design={design} designId={designId} panels={panels} view={player.view} onSettled={player.onSettled} cameraRequest={player.cameraRequest} />
        <div className="pointer-events-none absolute left-2 top-2 flex max-w-[calc(100%-9rem)] flex-col items-start gap-2">
          <h1 className="pointer-events-auto truncate rounded-md bg-paper-raised/90 px-2 py-1 text-base font-semibold text-ink shadow-sm">{name}</h1>
          <button
            type="button"
            onClick={() => setPanels((p) => !p)}
            aria-pressed={!panels}
            className="pointer-events-auto inline-flex min-h-[44px] items-center gap-1 rounded-md border border-paper-line bg-paper-raised/90 px-2 text-sm text-ink-soft hover:border-accent hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
          >
            {panels ? <EyeOff aria-hidden className="size-4" /> : <Eye aria-hidden className="size-4" />}
            {panels ? 'Hide panels' : 'Show panels'}
          </button>
        </div>
      </div>
      <aside aria-label="Steps and parts" className="hidden w-[360px] shrink-0 flex-col gap-3 overflow-y-auto border-l border-paper-line bg-paper-raised p-3 lg:flex">
        <StepPlayerControls player={player} />
        {sidePanel}
      </aside>
      <div className="lg:hidden">
        <ViewerSheet header={<StepPlayerControls player={player} />}>{sidePanel}</ViewerSheet>
      </div>
    </div>
  );
}

/** The canvas part, memoised so the page's own state (tabs, sheet) does not re-render the scene. */
const ViewerCanvas = memo(function ViewerCanvas({
  design,
  designId,
  panels,
  view,
  onSettled,
  cameraRequest,
}: {
  design: DesignDocument;
  designId: number;
  panels: boolean;
  view: PlayerView;
  onSettled: (stepIndex: number) => void;
  cameraRequest: CameraRequest | null;
}) {
  const display = useMemo(() => ({ units: design.units, panels, findingMarkers: false }), [design.units, panels]);
  return (
    <DesignViewer design={design} display={display} cameraRequest={cameraRequest} frameKey={designId} testId="viewer-canvas">
      <StepPlayerScene view={view} onSettled={onSettled} />
    </DesignViewer>
  );
});

function ViewerTabs({
  tab,
  onTab,
  player,
  analysis,
  design,
}: {
  tab: 'steps' | 'parts' | 'tools';
  onTab: (t: 'steps' | 'parts' | 'tools') => void;
  player: StepPlayerState;
  analysis: DesignAnalysis | null;
  design: DesignDocument;
}) {
  const tabs = [
    { id: 'steps' as const, label: 'Steps' },
    { id: 'parts' as const, label: 'Parts' },
    { id: 'tools' as const, label: 'Tools' },
  ];
  return (
    <div className="flex min-w-0 flex-col gap-2">
      <div role="tablist" aria-label="Viewer tables" className="flex gap-1 border-b border-paper-line">
        {tabs.map((t) => (
          <button
            key={t.id}
            type="button"
            role="tab"
            aria-selected={tab === t.id}
            onClick={() => onTab(t.id)}
            className={`min-h-[44px] px-3 text-sm font-medium focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent ${tab === t.id ? 'border-b-2 border-accent text-accent-strong' : 'text-ink-soft'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" className="min-w-0 overflow-x-auto">
        {tab === 'steps' && <StepList player={player} />}
        {tab === 'parts' && (analysis ? <PartsTab lines={analysis.bom} units={design.units} designName={design.name} /> : <p className="text-sm text-ink-muted">Counting parts…</p>)}
        {tab === 'tools' && (analysis ? <ToolsTab tools={analysis.tools} /> : <p className="text-sm text-ink-muted">Listing tools…</p>)}
      </div>
    </div>
  );
}

/**
 * Sizes the page to the window below its top edge: on phones the app's bar sits above it and the
 * page has no definite height to fill, so the canvas would collapse.
 */
function useFillWindowBelow() {
  const ref = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const fit = () => {
      const top = el.getBoundingClientRect().top + window.scrollY;
      el.style.height = `${Math.max(320, window.innerHeight - top)}px`;
    };
    fit();
    window.addEventListener('resize', fit);
    return () => window.removeEventListener('resize', fit);
  }, []);
  return ref;
}

/** The analysis, computed after the first frame so the model shows first. */
function useDeferredAnalysis(design: DesignDocument): DesignAnalysis | null {
  const [analysis, setAnalysis] = useState<DesignAnalysis | null>(null);
  useEffect(() => {
    const timer = window.setTimeout(() => setAnalysis(analyzeDesign(design, defaultCatalogue)), 50);
    return () => window.clearTimeout(timer);
  }, [design]);
  return analysis;
}

function ViewerProblem({ message }: { message: string }) {
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 p-8">
      <ErrorNotice title="Cannot open this design" message={message} />
      <Link to="/designs" className="text-sm font-medium text-accent-strong underline underline-offset-2 focus-ring">
        Back to designs
      </Link>
    </div>
  );
}
