import { useState } from 'react';
import { Frame, Plus } from 'lucide-react';
import { Button, EmptyState, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useAllBuilds } from '../api/designBuilds';
import { useDesigns } from '../api/listDesigns';
import type { DesignSummary } from '../api/schemas';
import { DesignCard } from './DesignCard';
import { AssignBuildDialog } from './AssignBuildDialog';
import { DeleteDesignDialog } from './DeleteDesignDialog';
import { NewDesignDialog } from './NewDesignDialog';
import { ShareDialog } from './ShareDialog';
import { ImportDesignButton } from './ImportDesignButton';

export default function DesignsPage() {
  const designs = useDesigns();
  const [creating, setCreating] = useState(false);
  const [deleting, setDeleting] = useState<DesignSummary | null>(null);
  const [assigning, setAssigning] = useState<DesignSummary | null>(null);
  const builds = useAllBuilds();
  const [sharing, setSharing] = useState<DesignSummary | null>(null);
  const newDesignButton = (
    <Button variant="primary" icon={<Plus aria-hidden className="size-4" />} onClick={() => setCreating(true)}>
      New design
    </Button>
  );

  return (
    <PageFrame>
      <PageHeader title="Designs" description="Frames your shop is drawing, newest changes first." actions={<div className="flex gap-2"><ImportDesignButton />{newDesignButton}</div>} />
      {designs.isPending ? (
        <DesignGridSkeleton />
      ) : designs.error ? (
        <ErrorNotice title="Designs could not be loaded" message={messageOf(designs.error)} onRetry={() => void designs.refetch()} />
      ) : designs.data.length === 0 ? (
        <EmptyState icon={<Frame className="size-7" />} title="No designs yet" action={newDesignButton}>
          Start a frame from an empty design: pick a profile system, then lay out profiles, joints and panels in the editor.
        </EmptyState>
      ) : (
        <ul aria-label="Designs" className="grid grid-cols-1 gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {sortByUpdated(designs.data).map((design) => (
            <DesignCard
              key={design.id}
              design={design}
              onDelete={setDeleting}
              builds={builds.data?.filter((build) => build.designId === design.id)}
              onAssignBuild={setAssigning}
              onShare={setSharing}
            />
          ))}
        </ul>
      )}
      <NewDesignDialog open={creating} onClose={() => setCreating(false)} />
      <DeleteDesignDialog design={deleting} onClose={() => setDeleting(null)} />
      <AssignBuildDialog design={assigning} onClose={() => setAssigning(null)} />
      <ShareDialog design={sharing} onClose={() => setSharing(null)} />
    </PageFrame>
  );
}

function sortByUpdated(designs: DesignSummary[]): DesignSummary[] {
  return [...designs].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
}

function DesignGridSkeleton() {
  return (
    <div role="status" className="grid grid-cols-1 gap-4 sm:grid-cols-2 xl:grid-cols-3">
      <span className="sr-only">Loading designs…</span>
      {[0, 1, 2].map((key) => (
        <div key={key} className="flex flex-col overflow-hidden rounded-card border border-paper-line bg-paper-raised">
          <Skeleton className="aspect-[4/3] rounded-none" />
          <div className="flex flex-col gap-2 p-4">
            <Skeleton className="h-5 w-2/3" />
            <Skeleton className="h-4 w-1/2" />
            <Skeleton className="h-3 w-1/3" />
          </div>
        </div>
      ))}
    </div>
  );
}
