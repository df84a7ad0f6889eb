import { useState, type FormEvent } from 'react';
import { Button, Dialog, DialogActions, ErrorNotice, TextField } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useCreateLink } from '../api/createLink';
import { useInviteCustomer } from '../api/inviteCustomer';
import type { DesignSummary } from '../api/schemas';

/** Share a design: invite a customer to review it, or make a read-only link (optionally e-mailed). */
export function ShareDialog({ design, onClose }: { design: DesignSummary | null; onClose: () => void }) {
  const invite = useInviteCustomer();
  const link = useCreateLink();
  const [email, setEmail] = useState('');
  const [linkEmail, setLinkEmail] = useState('');
  const [pin, setPin] = useState(false);
  const [ends, setEnds] = useState('');
  const close = () => {
    invite.reset();
    link.reset();
    setEmail('');
    setLinkEmail('');
    onClose();
  };
  if (!design) return null;
  const sendInvite = (event: FormEvent) => {
    event.preventDefault();
    invite.mutate({ designId: design.id, email });
  };
  const makeLink = (event: FormEvent) => {
    event.preventDefault();
    link.mutate({ designId: design.id, revision: pin ? design.latestRevision : null, expiresAt: ends ? new Date(`${ends}T23:59:59`).toISOString() : null, email: linkEmail || undefined });
  };
  return (
    <Dialog open title={`Share ${design.name}`} onClose={close}>
      <div className="flex flex-col gap-6">
        <form onSubmit={sendInvite} className="flex flex-col gap-3" aria-label="Invite a customer">
          <h3 className="text-sm font-semibold text-ink">Invite a customer to review</h3>
          <TextField id="invite-email" label="Customer's email" type="email" required value={email} onChange={(event) => setEmail(event.target.value)} />
          {invite.isSuccess && (
            <p role="status" className="text-sm text-ink-soft">
              Invitation sent to {invite.data.share.customer.email}
              {invite.data.accountCreated ? ' with a link to choose a password.' : '.'}
            </p>
          )}
          {invite.error && <ErrorNotice message={messageOf(invite.error)} />}
          <Button type="submit" variant="primary" pending={invite.isPending}>Send invitation</Button>
        </form>
        <form onSubmit={makeLink} className="flex flex-col gap-3" aria-label="Read-only link">
          <h3 className="text-sm font-semibold text-ink">Read-only link (no sign-in)</h3>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={pin} onChange={(event) => setPin(event.target.checked)} /> Keep showing revision {design.latestRevision}
          </label>
          <TextField id="link-ends" label="Stops working after (optional)" type="date" value={ends} onChange={(event) => setEnds(event.target.value)} />
          <TextField id="link-email" label="E-mail it to (optional)" type="email" value={linkEmail} onChange={(event) => setLinkEmail(event.target.value)} />
          {link.isSuccess && <input readOnly aria-label="Link address" value={link.data.url} className="w-full rounded border border-paper-line p-2 font-mono text-xs" onFocus={(event) => event.target.select()} />}
          {link.error && <ErrorNotice message={messageOf(link.error)} />}
          <Button type="submit" pending={link.isPending}>Make link</Button>
        </form>
        <DialogActions>
          <Button onClick={close}>Done</Button>
        </DialogActions>
      </div>
    </Dialog>
  );
}
