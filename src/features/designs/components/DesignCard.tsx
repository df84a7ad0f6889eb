import { Link } from 'react-router';
import { Eye, Hammer, History, Share2, Trash } from 'lucide-react';
import { BUILD_STATE_LABELS, type BuildSummary } from '@/domain/contracts/builds';
import { firstName, formatRelativeTime, pluralize } from '@/lib/format';
import { profileSystemLabel } from '../profileSystems';
import type { DesignSummary } from '../api/schemas';
import { DesignThumbnail } from './DesignThumbnail';

export interface DesignCardProps {
  design: DesignSummary;
  onDelete: (design: DesignSummary) => void;
  /** Builds of this design, with their progress. */
  builds?: BuildSummary[];
  onAssignBuild?: (design: DesignSummary) => void;
  onShare?: (design: DesignSummary) => void;
}

/** One design in the list: picture and name open the editor; the bin asks before deleting. */
export function DesignCard({ design, onDelete, builds = [], onAssignBuild, onShare }: DesignCardProps) {
  return (
    // The ring goes on the whole card when its link has keyboard focus (the title's own box is small).
    <li className="group relative flex flex-col overflow-hidden rounded-card border border-paper-line bg-paper-raised transition-shadow hover:shadow-md has-[a:focus-visible]:outline-3 has-[a:focus-visible]:outline-offset-2 has-[a:focus-visible]:outline-[#0b7a75] has-[a:focus-visible]:outline-solid">
      <div className="aspect-[4/3] border-b border-paper-line bg-gradient-to-b from-paper-sunk/40 to-paper-sunk p-4">
        <DesignThumbnail url={design.thumbnailUrl} name={design.name} />
      </div>
      {/* The actions wrap under the name when the card is narrow, so the name and system never squeeze to one word a line. */}
      <div className="flex flex-wrap items-start gap-2 p-4">
        <div className="flex min-w-[12rem] flex-1 basis-48 flex-col gap-1">
          <h2 className="text-base font-semibold text-pretty break-words text-ink">
            {/* The link's box covers the card so the whole card is one target. */}
            <Link to={`/designs/${design.id}`} className="rounded outline-none after:absolute after:inset-0 after:content-[''] focus-visible:outline-none">
              {design.name}
            </Link>
          </h2>
          <p className="flex flex-wrap gap-x-2 text-sm text-ink-soft">
            <span>{profileSystemLabel(design.systemId)}</span>
            <span aria-hidden>·</span>
            <span className="tabular-nums">{pluralize(design.profileCount, 'profile')}</span>
          </p>
          <p className="text-xs text-ink-muted">
            Updated <time dateTime={design.updatedAt}>{formatRelativeTime(design.updatedAt)}</time> by {firstName(design.updatedBy.displayName)}
          </p>
          {design.approval && (
            <p className="relative z-10 text-xs font-medium" data-testid="approval">
              {design.approval.decision === 'approved' ? `Approved r${design.approval.revision}` : `Changes asked on r${design.approval.revision}`} by {design.approval.by}
              {!design.approval.current && ` · r${design.latestRevision} not yet reviewed`}
            </p>
          )}
        </div>
        <div className="ml-auto flex shrink-0 gap-1">
          {onShare && (
            <button type="button" onClick={() => onShare(design)} aria-label={`Share ${design.name}`} title="Share" className="relative z-10 grid size-11 shrink-0 place-items-center rounded-lg text-ink-muted hover:bg-paper-sunk hover:text-ink focus-ring">
              <Share2 aria-hidden className="size-5" />
            </button>
          )}
          <Link to={`/designs/${design.id}/view`} aria-label={`Look at ${design.name} and play its build`} title="Look and play the build (read only)" className="relative z-10 grid size-11 shrink-0 place-items-center rounded-lg text-ink-muted hover:bg-paper-sunk hover:text-ink focus-ring">
            <Eye aria-hidden className="size-5" />
          </Link>
          <Link to={`/designs/${design.id}/history`} aria-label={`Revisions and files of ${design.name}`} title="Revisions and files" className="relative z-10 grid size-11 shrink-0 place-items-center rounded-lg text-ink-muted hover:bg-paper-sunk hover:text-ink focus-ring">
            <History aria-hidden className="size-5" />
          </Link>
          <button
            type="button"
            onClick={() => onDelete(design)}
            aria-label={`Delete ${design.name}`}
            title="Delete design"
            className="relative z-10 grid size-11 shrink-0 place-items-center rounded-lg text-ink-muted hover:bg-severity-error-soft hover:text-severity-error focus-ring"
          >
            <Trash aria-hidden className="size-5" />
          </button>
        </div>
      </div>
      {onAssignBuild || builds.length > 0 ? (
        <div className="relative z-10 flex flex-col gap-2 border-t border-paper-line px-4 py-3">
          {builds.length > 0 ? (
            <ul aria-label={`Builds of ${design.name}`} className="flex flex-col gap-1 text-sm">
              {builds.map((build) => (
                <li key={build.id} data-testid="design-build-progress">
                  <Link to={`/workbench/builds/${build.id}`} className="underline-offset-2 hover:underline focus-ring">
                    Build {build.id} · {BUILD_STATE_LABELS[build.state]} · {pluralize(build.progress.cut, 'piece')} cut · {pluralize(build.progress.step, 'step')} done
                  </Link>
                  <span className="text-ink-muted"> · {build.builders.map((person) => firstName(person.displayName)).join(', ')}</span>
                </li>
              ))}
            </ul>
          ) : null}
          {onAssignBuild ? (
            <button type="button" onClick={() => onAssignBuild(design)} className="inline-flex min-h-11 items-center gap-2 self-start rounded-lg px-2 text-sm font-medium text-ink-soft hover:bg-paper-sunk hover:text-ink focus-ring">
              <Hammer aria-hidden className="size-4" /> Assign build
            </button>
          ) : null}
        </div>
      ) : null}
    </li>
  );
}
