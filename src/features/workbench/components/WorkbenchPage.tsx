import { Link } from 'react-router';
import { CalendarClock, Hammer } from 'lucide-react';
import { EmptyState, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { BUILD_STATE_LABELS, BUILD_STATE_VALUES, type BuildSummary } from '@/domain/contracts/builds';
import { pluralize } from '@/lib/format';
import { useMyBuilds } from '../api/listMyBuilds';

function BuildCard({ build }: { build: BuildSummary }) {
  return (
    <li>
      <Link
        to={`/workbench/builds/${build.id}`}
        className="flex min-h-11 flex-col gap-1 rounded-card border border-paper-line bg-paper-raised p-4 hover:shadow-md focus-ring"
        data-testid="build-card"
      >
        <span className="text-base font-semibold text-ink">{build.designName}</span>
        <span className="text-sm text-ink-soft">
          Build {build.id} · revision {build.revision}
          {build.dueDate ? (
            <>
              {' '}· <CalendarClock aria-hidden className="inline size-4" /> due <time dateTime={build.dueDate}>{build.dueDate}</time>
            </>
          ) : null}
        </span>
        <span className="text-sm tabular-nums text-ink-soft">
          {pluralize(build.progress.cut, 'piece')} cut · {pluralize(build.progress.kit, 'kit line')} gathered · {pluralize(build.progress.step, 'step')} done
        </span>
        {build.note ? <span className="text-sm text-ink">{build.note}</span> : null}
      </Link>
    </li>
  );
}

/** The builder's page: the builds assigned to me, grouped by state, nearest due date first. */
export default function WorkbenchPage() {
  const builds = useMyBuilds();
  return (
    <PageFrame>
      <PageHeader title="Workbench" description="Builds assigned to you, ready to cut and assemble." />
      {builds.isPending ? (
        <Skeleton className="h-32" />
      ) : builds.isError ? (
        <ErrorNotice title="Your builds could not be loaded" message={builds.error.message} onRetry={() => void builds.refetch()} />
      ) : builds.data.length === 0 ? (
        <EmptyState icon={<Hammer className="size-7" />} title="No builds assigned to you yet">
          When a designer assigns you a build, it appears here: the cut list with machining, the parts kit with tick boxes, and the step-by-step assembly. Your progress is saved, so a second device or a second builder sees where you are.
        </EmptyState>
      ) : (
        <div className="flex flex-col gap-6">
          {BUILD_STATE_VALUES.map((state) => {
            const inState = builds.data.filter((build) => build.state === state);
            if (inState.length === 0) return null;
            return (
              <section key={state} aria-labelledby={`state-${state}`}>
                <h2 id={`state-${state}`} className="mb-2 text-lg font-semibold text-ink">
                  {BUILD_STATE_LABELS[state]} <span className="text-ink-muted">({inState.length})</span>
                </h2>
                <ul className="grid gap-3 sm:grid-cols-2">
                  {inState.map((build) => (
                    <BuildCard key={build.id} build={build} />
                  ))}
                </ul>
              </section>
            );
          })}
        </div>
      )}
    </PageFrame>
  );
}
