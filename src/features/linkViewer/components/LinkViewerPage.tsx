import { useCallback, useMemo, useState } from 'react';
import { useParams, useSearchParams } from 'react-router';
import { Code, Layers, Ruler, Scissors, Table2, Move3d } from 'lucide-react';
import { analyzeDesign } from '@/domain/analysis/analyze';
import type { LengthUnit } from '@/domain/units';
import { DesignViewer } from '@/components/viewer';
import { MeasureTool, OverallDimensions, SectionPlane, type SectionAxis } from '@/components/viewer/tools';
import { PartsTab } from '@/components/outputs';
import { Button, Dialog, ErrorNotice, PageSkeleton } from '@/components/ui';
import { isApiError } from '@/lib/apiClient';
import { messageOf } from '@/lib/formErrors';
import { cn } from '@/lib/cn';
import { useSharedDesign } from '../api/getSharedDesign';
import { GltfExportButton } from './GltfExportButton';

/**
 * The read-only link viewer (no sign-in): orbit and zoom, panels on/off, overall dimensions, a
 * section plane along X, Y or Z, a two-point measure, the bill of materials and an embed snippet.
 * `?embed=1` hides the page chrome for iframes.
 */
export default function LinkViewerPage() {
  const { token = '' } = useParams();
  const [search] = useSearchParams();
  const embedded = search.get('embed') === '1';
  const shared = useSharedDesign(token);

  if (shared.isPending) return <PageSkeleton />;
  if (shared.error) {
    const gone = isApiError(shared.error) && shared.error.status === 404;
    return (
      <main className="mx-auto max-w-xl p-8" data-testid="link-error">
        <ErrorNotice
          title={gone ? 'This link does not work' : 'The design could not be loaded'}
          message={gone ? 'It may have expired or been withdrawn. Ask whoever sent it for a new one.' : messageOf(shared.error)}
        />
      </main>
    );
  }
  return <SharedView token={token} embedded={embedded} data={shared.data} />;
}

type Data = NonNullable<ReturnType<typeof useSharedDesign>['data']>;

function SharedView({ token, embedded, data }: { token: string; embedded: boolean; data: Data }) {
  const design = data.revision.document;
  const units: LengthUnit = design.units === 'in' ? 'in' : 'mm';
  const analysis = useMemo(() => analyzeDesign(design), [design]);
  const [panels, setPanels] = useState(true);
  const [dimensions, setDimensions] = useState(true);
  const [sectionAxis, setSectionAxis] = useState<SectionAxis | null>(null);
  const [sectionAt, setSectionAt] = useState(0.5);
  const [measuring, setMeasuring] = useState(false);
  const [measured, setMeasured] = useState<number | null>(null);
  const [bomOpen, setBomOpen] = useState(false);
  const [embedOpen, setEmbedOpen] = useState(false);
  const [selection, setSelection] = useState<string[]>([]);
  const onMeasure = useCallback((mm: number | null) => setMeasured(mm), []);

  const bounds = useMemo(() => designBounds(design), [design]);
  const sectionOffset = sectionAxis ? bounds.min[sectionAxis] + (bounds.max[sectionAxis] - bounds.min[sectionAxis]) * sectionAt : 0;
  const selectedLengths = design.profiles.filter((profile) => selection.includes(profile.id)).map((profile) => ({ id: profile.id, length: profile.length }));

  return (
    <div className="flex h-dvh flex-col bg-paper" data-testid="link-viewer">
      {!embedded && (
        <header className="flex flex-wrap items-center gap-3 border-b border-paper-line bg-paper-raised px-4 py-2">
          <div className="min-w-0 flex-1">
            <h1 className="truncate text-lg font-semibold text-ink">{data.design.name}</h1>
            <p className="text-xs text-ink-muted">
              Read-only view · revision {data.revision.number}
              {data.link.label ? ` · ${data.link.label}` : ''}
            </p>
          </div>
          <Button variant="ghost" icon={<Code aria-hidden className="size-4" />} onClick={() => setEmbedOpen(true)}>
            Embed
          </Button>
          <GltfExportButton design={design} />
        </header>
      )}
      <div role="toolbar" aria-label="View tools" className="flex flex-wrap items-center gap-2 border-b border-paper-line bg-paper-raised px-4 py-2 text-sm">
        <Toggle pressed={panels} onClick={() => setPanels(!panels)} icon={<Layers aria-hidden className="size-4" />}>Panels</Toggle>
        <Toggle pressed={dimensions} onClick={() => setDimensions(!dimensions)} icon={<Move3d aria-hidden className="size-4" />}>Dimensions</Toggle>
        <Toggle pressed={measuring} onClick={() => setMeasuring(!measuring)} icon={<Ruler aria-hidden className="size-4" />}>Measure</Toggle>
        <fieldset className="flex items-center gap-1">
          <legend className="sr-only">Section view</legend>
          <Scissors aria-hidden className="size-4 text-ink-soft" />
          <span className="text-ink-soft">Section</span>
          {(['off', 'x', 'y', 'z'] as const).map((axis) => (
            <Toggle key={axis} pressed={(sectionAxis ?? 'off') === axis} onClick={() => setSectionAxis(axis === 'off' ? null : axis)}>
              {axis === 'off' ? 'Off' : axis.toUpperCase()}
            </Toggle>
          ))}
          {sectionAxis && (
            <input
              type="range"
              min={0}
              max={1}
              step={0.01}
              value={sectionAt}
              onChange={(event) => setSectionAt(Number(event.target.value))}
              aria-label={`Section position along ${sectionAxis.toUpperCase()}`}
              className="w-36"
            />
          )}
        </fieldset>
        <Toggle pressed={bomOpen} onClick={() => setBomOpen(!bomOpen)} icon={<Table2 aria-hidden className="size-4" />}>Bill of materials</Toggle>
        {measuring && (
          <span className="text-ink-soft" aria-live="polite">
            {measured === null ? 'Click two points on the parts.' : null}
          </span>
        )}
      </div>
      <div className="flex min-h-0 flex-1">
        <div className="relative min-w-0 flex-1">
          <DesignViewer
            design={design}
            analysis={analysis}
            selection={selection}
            display={{ units, panels, findingMarkers: false }}
            onPartClick={measuring ? undefined : (id) => setSelection((current) => (current.includes(id) ? [] : [id]))}
            onEmptyClick={() => setSelection([])}
          >
            <SectionPlane axis={sectionAxis} offset={sectionOffset} />
            {dimensions && <OverallDimensions units={units} selectedLengths={selectedLengths} designKey={design} />}
            <MeasureTool enabled={measuring} units={units} onMeasure={onMeasure} />
          </DesignViewer>
        </div>
        {bomOpen && (
          <aside aria-label="Bill of materials" className="w-full max-w-xl overflow-auto border-l border-paper-line bg-paper-raised p-3">
            <PartsTab lines={analysis.bom} units={units} designName={design.name} />
          </aside>
        )}
      </div>
      <Dialog open={embedOpen} title="Embed this view" description="Paste this into a web page; it shows the same read-only view." onClose={() => setEmbedOpen(false)}>
        <textarea readOnly className="h-24 w-full rounded border border-paper-line p-2 font-mono text-xs" value={`<iframe src="${window.location.origin}/view/${token}?embed=1" width="800" height="600" style="border:0" allowfullscreen title="${data.design.name.replace(/"/g, '&quot;')}"></iframe>`} />
      </Dialog>
    </div>
  );
}

function Toggle({ pressed, onClick, icon, children }: { pressed: boolean; onClick: () => void; icon?: React.ReactNode; children: React.ReactNode }) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      onClick={onClick}
      className={cn('inline-flex min-h-9 items-center gap-1.5 rounded-md border px-2.5 focus-ring', pressed ? 'border-accent bg-accent text-accent-ink' : 'border-paper-line bg-paper text-ink hover:bg-paper-sunk')}
    >
      {icon}
      {children}
    </button>
  );
}

/** Extent of the profiles' end points, mm; enough to place a section plane. */
function designBounds(design: Data['revision']['document']) {
  const min = { x: Infinity, y: Infinity, z: Infinity };
  const max = { x: -Infinity, y: -Infinity, z: -Infinity };
  for (const profile of design.profiles) {
    const ends = [profile.start, profile.start.map((value, index) => value + profile.direction[index] * profile.length)];
    for (const [x, y, z] of ends) {
      min.x = Math.min(min.x, x); min.y = Math.min(min.y, y); min.z = Math.min(min.z, z);
      max.x = Math.max(max.x, x); max.y = Math.max(max.y, y); max.z = Math.max(max.z, z);
    }
  }
  if (!Number.isFinite(min.x)) return { min: { x: -500, y: 0, z: -500 }, max: { x: 500, y: 1000, z: 500 } };
  return { min, max };
}
