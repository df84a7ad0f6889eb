import { useEffect, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router';
import { Printer, Tags } from 'lucide-react';
import { ErrorNotice, PageFrame, PageSkeleton } from '@/components/ui';
import { useCurrentUser } from '@/lib/session/currentUser';
import { BUILD_STATE_LABELS, BUILD_STATE_VALUES, type BuildState } from '@/domain/contracts/builds';
import { cn } from '@/lib/cn';
import { useChangeBuildState } from '../api/changeBuildState';
import { useBuildData } from '../hooks/useBuildData';
import { useBuildProgress } from '../hooks/useBuildProgress';
import { BuildTab } from './BuildTab';
import { ConnectionBanner } from './ConnectionBanner';
import { CutTab } from './CutTab';
import { KitTab } from './KitTab';
import { OfflineCopyButton } from './OfflineCopyButton';

const TABS = [
  { id: 'cut', label: 'Cut' },
  { id: 'kit', label: 'Kit' },
  { id: 'build', label: 'Build' },
] as const;
type Tab = (typeof TABS)[number]['id'];

/** One build on the shop floor: Cut, Kit and Build, progress saved on the server (or queued offline). */
export default function BuildPage() {
  const buildId = Number(useParams().buildId);
  const [params, setParams] = useSearchParams();
  const tab: Tab = (TABS.find((item) => item.id === params.get('tab'))?.id ?? 'cut') as Tab;
  const me = useCurrentUser();
  const data = useBuildData(buildId);
  const canTick = me.data?.role === 'builder';
  const progress = useBuildProgress(data.detail, canTick);
  const changeState = useChangeBuildState();
  const [stepIndex, setStepIndex] = useState<number | null>(null);

  // Open at the step a label points to, else resume at the first step not yet done.
  const steps = data.steps;
  const recordsReady = data.detail !== undefined;
  useEffect(() => {
    if (stepIndex !== null || !steps || !recordsReady) return;
    const wanted = params.get('step');
    const fromLink = wanted ? steps.findIndex((step) => step.id === wanted) : -1;
    const firstOpen = steps.findIndex((step) => !progress.isDone('step', step.id));
    setStepIndex(fromLink >= 0 ? fromLink : firstOpen >= 0 ? firstOpen : Math.max(0, steps.length - 1));
  }, [steps, recordsReady, stepIndex, params, progress]);

  if (data.build.isError) return <PageFrame><ErrorNotice title="This build could not be opened" message={data.build.error.message} /></PageFrame>;
  if (data.revision.isError) return <PageFrame><ErrorNotice title="The design of this build could not be loaded" message={data.revision.error.message} /></PageFrame>;
  if (!data.detail || !data.design || !data.analysis || !data.steps || !data.sequence) return <PageSkeleton label="Loading the build" />;
  const { build } = data.detail;

  return (
    <PageFrame>
      <header className="flex flex-col gap-3 border-b border-paper-line pb-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <p className="text-sm text-ink-soft">
              <Link to={canTick ? '/workbench' : '/designs'} className="underline">
                {canTick ? 'Workbench' : 'Designs'}
              </Link>{' '}
              · Build {build.id} · revision {build.revision}
              {build.dueDate ? ` · due ${build.dueDate}` : ''} · {build.builders.map((person) => person.displayName).join(', ')}
            </p>
            <h1 className="text-2xl font-semibold text-ink">{build.designName}</h1>
            {build.note ? <p className="text-ink">{build.note}</p> : null}
          </div>
          <div className="flex flex-wrap items-center gap-2">
            <label className="flex items-center gap-2 text-sm text-ink-soft">
              State
              <select
                className="min-h-11 rounded-lg border border-paper-line bg-paper-raised px-3 text-base text-ink focus-ring"
                value={build.state}
                disabled={changeState.isPending}
                onChange={(event) => changeState.mutate({ buildId: build.id, state: event.target.value as BuildState })}
              >
                {BUILD_STATE_VALUES.map((state) => (
                  <option key={state} value={state}>
                    {BUILD_STATE_LABELS[state]}
                  </option>
                ))}
              </select>
            </label>
            <Link to={`/workbench/builds/${build.id}/print`} className="inline-flex min-h-11 items-center gap-2 rounded-lg border border-paper-line bg-paper-raised px-4 text-sm focus-ring">
              <Printer aria-hidden className="size-4" /> Print instructions
            </Link>
            <Link to={`/workbench/builds/${build.id}/labels`} className="inline-flex min-h-11 items-center gap-2 rounded-lg border border-paper-line bg-paper-raised px-4 text-sm focus-ring">
              <Tags aria-hidden className="size-4" /> Piece labels
            </Link>
            <OfflineCopyButton detail={data.detail} />
          </div>
        </div>
        {build.latestDesignRevision > build.revision ? (
          <p role="note" className="rounded-lg bg-severity-note-soft px-4 py-2 text-sm">
            The design has a newer revision ({build.latestDesignRevision}) than the one this build follows ({build.revision}). Keep building revision {build.revision} unless the designer moves the build.
          </p>
        ) : null}
        {progress.notice ? (
          <p role="alert" data-testid="revision-notice" className="rounded-lg bg-severity-warning-soft px-4 py-2 text-sm">
            {progress.notice.message}
          </p>
        ) : null}
        {progress.refusal ? <ErrorNotice title="A tick was refused" message={progress.refusal} /> : null}
        <ConnectionBanner progress={progress} />
        <nav aria-label="Build sections" className="flex gap-2">
          {TABS.map((item) => (
            <button
              key={item.id}
              type="button"
              aria-current={tab === item.id ? 'page' : undefined}
              onClick={() => setParams((current) => {
                const next = new URLSearchParams(current);
                next.set('tab', item.id);
                next.delete('step');
                return next;
              }, { replace: true })}
              className={cn('min-h-11 flex-1 rounded-lg border px-4 text-base font-semibold focus-ring sm:flex-none', tab === item.id ? 'border-accent bg-accent text-accent-ink' : 'border-paper-line bg-paper-raised text-ink')}
            >
              {item.label}
              <span className="ml-2 text-sm font-normal tabular-nums">
                {item.id === 'cut' ? `${build.progress.cut}/${data.analysis!.cutList.length}` : item.id === 'kit' ? `${build.progress.kit}` : `${build.progress.step}/${data.steps!.length}`}
              </span>
            </button>
          ))}
        </nav>
      </header>
      {tab === 'cut' ? <CutTab design={data.design} analysis={data.analysis} progress={progress} canTick={canTick} /> : null}
      {tab === 'kit' ? <KitTab analysis={data.analysis} progress={progress} canTick={canTick} /> : null}
      {tab === 'build' && stepIndex !== null ? (
        <BuildTab design={data.design} steps={data.steps} sequenceSteps={data.sequence.steps} index={stepIndex} onIndex={setStepIndex} progress={progress} canTick={canTick} />
      ) : null}
    </PageFrame>
  );
}
