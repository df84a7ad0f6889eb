import { useState, type FormEvent } from 'react';
import { GraduationCap, Link2, Plus } from 'lucide-react';
import { Button, ConfirmDialog, Dialog, DialogActions, EmptyState, ErrorNotice, PageFrame, PageHeader, SelectField, Skeleton, TextField } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { formatRelativeTime, pluralize } from '@/lib/format';
import { useAddClassLink } from '../api/addClassLink';
import { useCreateClass } from '../api/createClass';
import { useClasses } from '../api/listClasses';
import { useLinkDesigns } from '../api/listLinkDesigns';
import { useRevokeClass } from '../api/revokeClass';
import type { ClassView, CreatedLink } from '../api/schemas';

/** An instructor's classes: named groups of read-only links, their open counts, expiry and revoking. */
export default function ClassesPage() {
  const classes = useClasses();
  const [creating, setCreating] = useState(false);
  const [addingTo, setAddingTo] = useState<ClassView | null>(null);
  const [revoking, setRevoking] = useState<ClassView | null>(null);
  const [made, setMade] = useState<CreatedLink | null>(null);
  const revoke = useRevokeClass();
  const newClass = (
    <Button variant="primary" icon={<Plus aria-hidden className="size-4" />} onClick={() => setCreating(true)}>
      New class
    </Button>
  );

  return (
    <PageFrame>
      <PageHeader title="Classes" description="Read-only links you publish for your students, grouped by class." actions={newClass} />
      {classes.isPending ? (
        <Skeleton className="h-40" />
      ) : classes.error ? (
        <ErrorNotice title="Classes could not be loaded" message={messageOf(classes.error)} onRetry={() => void classes.refetch()} />
      ) : classes.data.length === 0 ? (
        <EmptyState icon={<GraduationCap className="size-7" />} title="No classes yet" action={newClass}>
          Make a class, add links to designs, and give the links to your students. They open the model and step through the build without signing in.
        </EmptyState>
      ) : (
        <ul aria-label="Classes" className="flex flex-col gap-4">
          {classes.data.map((item) => (
            <li key={item.id} className="rounded-card border border-paper-line bg-paper-raised p-4" data-testid={`class-${item.id}`}>
              <div className="flex flex-wrap items-start gap-3">
                <div className="min-w-0 flex-1">
                  <h2 className="text-base font-semibold text-ink">{item.name}</h2>
                  {item.description && <p className="text-sm text-ink-soft">{item.description}</p>}
                  <p className="text-xs text-ink-muted">
                    {item.active ? 'Active' : item.revokedAt ? 'Revoked' : 'Expired'} · {pluralize(item.links.length, 'link')} · opened {pluralize(item.openCount, 'time')}
                    {item.expiresAt ? ` · ends ${new Date(item.expiresAt).toLocaleDateString()}` : ''}
                  </p>
                </div>
                {item.active && (
                  <>
                    <Button icon={<Link2 aria-hidden className="size-4" />} onClick={() => setAddingTo(item)}>
                      Add link
                    </Button>
                    <Button variant="danger" onClick={() => setRevoking(item)}>
                      Revoke class
                    </Button>
                  </>
                )}
              </div>
              {item.links.length > 0 && (
                <table className="mt-3 w-full text-left text-sm">
                  <thead className="text-xs text-ink-muted">
                    <tr>
                      <th className="py-1 font-medium">Design</th>
                      <th className="py-1 font-medium">Revision</th>
                      <th className="py-1 font-medium">Opens</th>
                      <th className="py-1 font-medium">State</th>
                      <th className="py-1 font-medium">Made</th>
                    </tr>
                  </thead>
                  <tbody>
                    {item.links.map((link) => (
                      <tr key={link.id} className="border-t border-paper-line">
                        <td className="py-1">{link.designName}</td>
                        <td className="py-1 tabular-nums">{link.revision ?? 'latest'}</td>
                        <td className="py-1 tabular-nums">{link.openCount}</td>
                        <td className="py-1">{link.active ? 'works' : 'stopped'}</td>
                        <td className="py-1 text-ink-muted">{formatRelativeTime(link.createdAt)}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              )}
            </li>
          ))}
        </ul>
      )}
      <NewClassDialog open={creating} onClose={() => setCreating(false)} />
      <AddLinkDialog target={addingTo} onClose={() => setAddingTo(null)} onMade={setMade} />
      <Dialog open={made !== null} title="Link ready" description="Give this address to your students. It is shown only now; make a new link if you lose it." onClose={() => setMade(null)}>
        <input readOnly aria-label="Link address" data-testid="new-link-url" value={made?.url ?? ''} className="w-full rounded border border-paper-line p-2 font-mono text-xs" onFocus={(event) => event.target.select()} />
        <DialogActions>
          <Button variant="primary" onClick={() => void navigator.clipboard?.writeText(made?.url ?? '').finally(() => setMade(null))}>
            Copy and close
          </Button>
        </DialogActions>
      </Dialog>
      <ConfirmDialog
        open={revoking !== null}
        title={`Revoke ${revoking?.name ?? 'class'}?`}
        confirmLabel="Revoke class"
        pending={revoke.isPending}
        error={revoke.error ? messageOf(revoke.error) : null}
        onCancel={() => setRevoking(null)}
        onConfirm={() => revoking && revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) })}
      >
        Every link in this class stops working at once. Students who open one see that it no longer works.
      </ConfirmDialog>
    </PageFrame>
  );
}

function NewClassDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const create = useCreateClass();
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [ends, setEnds] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate(
      { name, description, expiresAt: ends ? new Date(`${ends}T23:59:59`).toISOString() : null },
      { onSuccess: () => { setName(''); setDescription(''); setEnds(''); onClose(); } },
    );
  };
  return (
    <Dialog open={open} title="New class" onClose={onClose}>
      <form onSubmit={submit} className="flex flex-col gap-3">
        <TextField id="class-name" label="Name" value={name} onChange={(event) => setName(event.target.value)} required error={create.error && 'fields' in create.error ? (create.error as { fields: Record<string, string> }).fields.name : undefined} />
        <TextField id="class-description" label="Description" value={description} onChange={(event) => setDescription(event.target.value)} />
        <TextField id="class-ends" label="Links stop working after (optional)" type="date" value={ends} onChange={(event) => setEnds(event.target.value)} />
        {create.error && <ErrorNotice message={messageOf(create.error)} />}
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" pending={create.isPending}>
            Create class
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

function AddLinkDialog({ target, onClose, onMade }: { target: ClassView | null; onClose: () => void; onMade: (link: CreatedLink) => void }) {
  const designs = useLinkDesigns();
  const add = useAddClassLink();
  const [designId, setDesignId] = useState('');
  const [pin, setPin] = useState(false);
  const chosen = designs.data?.find((design) => String(design.id) === designId) ?? designs.data?.[0];
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!target || !chosen) return;
    add.mutate(
      { classId: target.id, designId: chosen.id, revision: pin ? chosen.latestRevision : null },
      { onSuccess: (link) => { onClose(); onMade(link); } },
    );
  };
  return (
    <Dialog open={target !== null} title={`Add a link to ${target?.name ?? ''}`} onClose={onClose}>
      <form onSubmit={submit} className="flex flex-col gap-3">
        <SelectField
          id="link-design"
          label="Design"
          value={chosen ? String(chosen.id) : ''}
          onChange={(event) => setDesignId(event.target.value)}
          options={(designs.data ?? []).map((design) => ({ value: String(design.id), label: design.name }))}
        />
        <label className="flex items-center gap-2 text-sm text-ink">
          <input type="checkbox" checked={pin} onChange={(event) => setPin(event.target.checked)} />
          Keep showing revision {chosen?.latestRevision ?? ''} even after later saves
        </label>
        {add.error && <ErrorNotice message={messageOf(add.error)} />}
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" pending={add.isPending} disabled={!chosen}>
            Make link
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
