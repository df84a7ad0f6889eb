import { useMemo, useState, type FormEvent } from 'react';
import { useParams } from 'react-router';
import { Html } from '@react-three/drei';
import { Check, MapPin, Undo2 } from 'lucide-react';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { DesignViewer } from '@/components/viewer';
import { usePointPick, type PickedPoint } from '@/components/viewer/tools';
import { Button, ErrorNotice, PageSkeleton } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { formatRelativeTime } from '@/lib/format';
import { cn } from '@/lib/cn';
import { useReview } from '../api/getReview';
import { usePostComment } from '../api/postComment';
import { usePostDecision } from '../api/postDecision';
import type { Review, ReviewComment } from '../api/schemas';
import { DecisionBadge } from './DecisionBadge';

/** One design under review: the model with comment pins, the thread beside it, approve or ask for changes. */
export default function ReviewPage() {
  const designId = Number(useParams().designId);
  const review = useReview(designId);
  if (review.isPending) return <PageSkeleton />;
  if (review.error) return <ErrorNotice title="This review could not be loaded" message={messageOf(review.error)} onRetry={() => void review.refetch()} />;
  return <ReviewView review={review.data} />;
}

function PickForPin({ enabled, onPick }: { enabled: boolean; onPick: (picked: PickedPoint) => void }) {
  usePointPick(enabled, onPick);
  return null;
}

function Pins({ comments, active }: { comments: ReviewComment[]; active: number | null }) {
  return (
    <>
      {comments.map((comment, index) =>
        comment.position ? (
          <Html key={comment.id} position={comment.position} center zIndexRange={[30, 0]}>
            <span data-testid="comment-pin" className={cn('grid size-6 place-items-center rounded-full border-2 border-white text-xs font-bold text-white shadow', active === comment.id ? 'bg-accent' : 'bg-[#d9480f]')}>
              {index + 1}
            </span>
          </Html>
        ) : null,
      )}
    </>
  );
}

function ReviewView({ review }: { review: Review }) {
  const design = review.revision.document;
  const analysis = useMemo(() => analyzeDesign(design), [design]);
  const [pinning, setPinning] = useState(false);
  const [pin, setPin] = useState<PickedPoint | null>(null);
  const [body, setBody] = useState('');
  const [note, setNote] = useState('');
  const comment = usePostComment();
  const decide = usePostDecision();
  const latest = review.decisions[0] ?? null;
  const designId = review.design.id;
  const revision = review.revision.number;
  const pinned = review.comments.filter((item) => item.position);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    comment.mutate(
      { designId, revision, partId: pin?.partId ?? null, position: pin?.point ?? null, body },
      { onSuccess: () => { setBody(''); setPin(null); setPinning(false); } },
    );
  };

  return (
    <div className="flex h-[calc(100dvh-4rem)] min-h-0 flex-col lg:flex-row">
      <div className="relative min-h-80 flex-1">
        <DesignViewer design={design} analysis={analysis} selection={pin?.partId ? [pin.partId] : []} display={{ units: design.units === 'in' ? 'in' : 'mm', findingMarkers: false }}>
          <PickForPin enabled={pinning} onPick={(picked) => { setPin(picked); setPinning(false); }} />
          <Pins comments={pinned} active={null} />
        </DesignViewer>
      </div>
      <aside className="flex w-full flex-col gap-4 overflow-auto border-l border-paper-line bg-paper-raised p-4 lg:w-96" aria-label="Review">
        <div>
          <h1 className="text-lg font-semibold text-ink">{review.design.name}</h1>
          <p className="text-sm text-ink-soft">Revision {revision}</p>
          <DecisionBadge decision={latest} latestRevision={review.design.latestRevision} />
        </div>
        <section aria-label="Decision" className="flex flex-col gap-2">
          <textarea aria-label="Note with your decision" placeholder="A note with your decision (optional)" value={note} onChange={(event) => setNote(event.target.value)} className="min-h-16 rounded border border-paper-line p-2 text-sm" />
          <div className="flex gap-2">
            <Button variant="primary" icon={<Check aria-hidden className="size-4" />} pending={decide.isPending} onClick={() => decide.mutate({ designId, revision, decision: 'approved', note })}>
              Approve revision {revision}
            </Button>
            <Button icon={<Undo2 aria-hidden className="size-4" />} pending={decide.isPending} onClick={() => decide.mutate({ designId, revision, decision: 'changes_requested', note })}>
              Ask for changes
            </Button>
          </div>
          {decide.error && <ErrorNotice message={messageOf(decide.error)} />}
        </section>
        <section aria-label="Comments" className="flex flex-col gap-2">
          <h2 className="text-sm font-semibold text-ink">Comments</h2>
          <ol className="flex flex-col gap-2">
            {review.comments.map((item) => (
              <li key={item.id} className="rounded border border-paper-line p-2 text-sm" data-testid="comment">
                <p className="text-xs text-ink-muted">
                  {item.position ? `Pin ${pinned.indexOf(item) + 1} · ` : ''}
                  {item.author.displayName} · {formatRelativeTime(item.createdAt)}
                  {item.partId ? ` · part ${item.partId}` : ''} · rev {item.revision}
                </p>
                <p className="whitespace-pre-wrap text-ink">{item.body}</p>
              </li>
            ))}
          </ol>
          <form onSubmit={submit} className="flex flex-col gap-2">
            <Button icon={<MapPin aria-hidden className="size-4" />} aria-pressed={pinning} onClick={() => setPinning(!pinning)}>
              {pin ? `Pinned to ${pin.partId ?? 'a point'}` : pinning ? 'Click a part to pin…' : 'Pin to a part'}
            </Button>
            <textarea aria-label="Comment" required placeholder="Write a comment" value={body} onChange={(event) => setBody(event.target.value)} className="min-h-20 rounded border border-paper-line p-2 text-sm" />
            {comment.error && <ErrorNotice message={messageOf(comment.error)} />}
            <Button type="submit" variant="primary" pending={comment.isPending}>
              Post comment
            </Button>
          </form>
        </section>
      </aside>
    </div>
  );
}
