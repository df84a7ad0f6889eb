import { useState, type ChangeEvent } from 'react';
import { Link, useParams } from 'react-router';
import { Download, Trash, Upload as UploadIcon } from 'lucide-react';
import { Button, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { formatRelativeTime } from '@/lib/format';
import { useDeleteUpload } from '../api/deleteUpload';
import { useDiff } from '../api/getDiff';
import { useHistory } from '../api/getHistory';
import { useUploads } from '../api/listUploads';
import { useUploadFile } from '../api/uploadFile';

const APPROVAL_TEXT = { approved: 'Approved', changes_requested: 'Changes asked', not_reviewed: 'Not reviewed' } as const;

/** A design's revisions (author, time, approval), a comparison of two, exports, and attached files. */
export default function DesignHistoryPage() {
  const designId = Number(useParams().designId);
  const history = useHistory(designId);
  const [from, setFrom] = useState<number | null>(null);
  const [to, setTo] = useState<number | null>(null);
  const latest = history.data?.[0]?.number ?? 1;
  const a = from ?? Math.max(1, latest - 1);
  const b = to ?? latest;

  return (
    <PageFrame>
      <PageHeader
        title="Revisions and files"
        description="Every saved revision, what changed between two, exports, and photos or drawings attached to this design."
        actions={
          <div className="flex flex-wrap gap-2">
            {(['design.json', 'bom.csv', 'cutlist.csv'] as const).map((file) => (
              <a key={file} href={`/api/designs/${designId}/export/${file}`} className="inline-flex min-h-11 items-center gap-2 rounded-lg border border-paper-line bg-paper-raised px-3 text-sm focus-ring" download>
                <Download aria-hidden className="size-4" /> {file}
              </a>
            ))}
          </div>
        }
      />
      <section aria-label="Revisions" className="flex flex-col gap-2">
        <h2 className="text-base font-semibold">Revisions</h2>
        {history.isPending ? (
          <Skeleton className="h-24" />
        ) : history.error ? (
          <ErrorNotice message={messageOf(history.error)} />
        ) : (
          <table className="w-full text-left text-sm">
            <thead className="text-xs text-ink-muted">
              <tr><th>#</th><th>Saved</th><th>By</th><th>Note</th><th>Review</th><th>Compare</th><th /></tr>
            </thead>
            <tbody>
              {history.data.map((revision) => (
                <tr key={revision.number} className="border-t border-paper-line">
                  <td className="py-1 tabular-nums">{revision.number}</td>
                  <td>{formatRelativeTime(revision.createdAt)}</td>
                  <td>{revision.createdBy.displayName}</td>
                  <td className="text-ink-soft">{revision.message ?? ''}</td>
                  <td>{APPROVAL_TEXT[revision.approval.state]}{revision.approval.by ? ` by ${revision.approval.by}` : ''}</td>
                  <td>
                    <label className="mr-2"><input type="radio" name="from" checked={a === revision.number} onChange={() => setFrom(revision.number)} /> from</label>
                    <label><input type="radio" name="to" checked={b === revision.number} onChange={() => setTo(revision.number)} /> to</label>
                  </td>
                  <td><a className="text-accent underline" href={`/api/designs/${designId}/export/design.json?revision=${revision.number}`}>JSON</a></td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      {a !== b && <DiffTables designId={designId} from={a} to={b} />}
      <Uploads designId={designId} />
      <p className="text-sm"><Link to={`/designs/${designId}`} className="text-accent underline">Open in the editor</Link></p>
    </PageFrame>
  );
}

function DiffTables({ designId, from, to }: { designId: number; from: number; to: number }) {
  const diff = useDiff(designId, from, to);
  if (diff.isPending) return <Skeleton className="h-24" />;
  if (diff.error) return <ErrorNotice message={messageOf(diff.error)} />;
  const sign = (value: number) => (value > 0 ? `+${value}` : String(value));
  return (
    <section aria-label="Differences" className="flex flex-col gap-2">
      <h2 className="text-base font-semibold">Revision {from} → {to}</h2>
      {diff.data.bom.length === 0 && diff.data.cutList.length === 0 && <p className="text-sm text-ink-soft">The bill of materials and the cut list are the same.</p>}
      {diff.data.bom.length > 0 && (
        <table className="w-full text-left text-sm" aria-label="Bill of materials changes">
          <thead className="text-xs text-ink-muted"><tr><th>Code</th><th>Description</th><th>Before</th><th>After</th><th>Change</th></tr></thead>
          <tbody>{diff.data.bom.map((row) => (<tr key={`${row.code}${row.unit}`} className="border-t border-paper-line"><td><code className="text-xs">{row.code}</code></td><td>{row.description}</td><td className="tabular-nums">{row.before} {row.unit}</td><td className="tabular-nums">{row.after} {row.unit}</td><td className="tabular-nums">{sign(row.change)}</td></tr>))}</tbody>
        </table>
      )}
      {diff.data.cutList.length > 0 && (
        <table className="w-full text-left text-sm" aria-label="Cut list changes">
          <thead className="text-xs text-ink-muted"><tr><th>Profile</th><th>Length (mm)</th><th>Before</th><th>After</th><th>Change</th></tr></thead>
          <tbody>{diff.data.cutList.map((row) => (<tr key={`${row.variantId}${row.length}`} className="border-t border-paper-line"><td>{row.variantId}</td><td className="tabular-nums">{row.length}</td><td className="tabular-nums">{row.before}</td><td className="tabular-nums">{row.after}</td><td className="tabular-nums">{sign(row.change)}</td></tr>))}</tbody>
        </table>
      )}
    </section>
  );
}

function Uploads({ designId }: { designId: number }) {
  const uploads = useUploads(designId);
  const upload = useUploadFile();
  const remove = useDeleteUpload();
  const onFile = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    if (file) upload.mutate({ designId, file });
    event.target.value = '';
  };
  return (
    <section aria-label="Attached files" className="flex flex-col gap-2">
      <h2 className="text-base font-semibold">Photos and drawings</h2>
      <label className="inline-flex w-fit cursor-pointer items-center gap-2 rounded-lg border border-paper-line bg-paper-raised px-3 py-2 text-sm focus-within:outline-2">
        <UploadIcon aria-hidden className="size-4" /> Attach a photo or PDF (up to 10 MB)
        <input type="file" accept="image/jpeg,image/png,image/webp,application/pdf" className="sr-only" onChange={onFile} />
      </label>
      {upload.error && <ErrorNotice message={messageOf(upload.error)} />}
      {uploads.data && uploads.data.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {uploads.data.map((file) => (
            <li key={file.id} className="flex flex-col gap-1 rounded border border-paper-line p-2 text-xs">
              {file.thumbnailUrl ? <img src={file.thumbnailUrl} alt="" className="aspect-square w-full object-contain" /> : <div className="grid aspect-square place-items-center bg-paper-sunk">PDF</div>}
              <a href={file.fileUrl} className="truncate text-accent underline">{file.name}</a>
              <span className="text-ink-muted">{Math.ceil(file.sizeBytes / 1024)} KB · {file.uploadedBy.displayName}</span>
              <Button variant="ghost" icon={<Trash aria-hidden className="size-4" />} onClick={() => remove.mutate({ id: file.id, designId })}>Delete</Button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
