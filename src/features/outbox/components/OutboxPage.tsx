import { Mail } from 'lucide-react';
import { EmptyState, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { formatRelativeTime } from '@/lib/format';
import { useOutbox } from '../api/listOutbox';

/** The owner's outbox: every e-mail the app sent to the local mail catcher, with its text. */
export default function OutboxPage() {
  const outbox = useOutbox();
  return (
    <PageFrame>
      <PageHeader title="Outbox" description="E-mails Slotwise sent: invitations, comments, decisions, links and password resets." />
      {outbox.isPending ? (
        <Skeleton className="h-32" />
      ) : outbox.error ? (
        <ErrorNotice title="The outbox could not be loaded" message={messageOf(outbox.error)} onRetry={() => void outbox.refetch()} />
      ) : outbox.data.mode !== 'fake' ? (
        <EmptyState icon={<Mail className="size-7" />} title="Mail goes to your mail server">
          {outbox.data.mode === 'smtp' ? 'Messages are sent through the SMTP server in the settings; see its logs for what was sent.' : 'No SMTP server is set, so no mail is sent. Set SMTP_HOST to send mail.'}
        </EmptyState>
      ) : outbox.data.messages.length === 0 ? (
        <EmptyState icon={<Mail className="size-7" />} title="No mail sent yet">Messages appear here as Slotwise sends them.</EmptyState>
      ) : (
        <ul aria-label="Messages" className="flex flex-col gap-3">
          {outbox.data.messages.map((message) => (
            <li key={message.id} className="rounded-card border border-paper-line bg-paper-raised p-4" data-testid="outbox-message">
              <details>
                <summary className="cursor-pointer">
                  <span className="font-semibold text-ink">{message.subject}</span>
                  <span className="ml-2 text-sm text-ink-soft">to {message.to.join(', ')} · {formatRelativeTime(message.receivedAt)}</span>
                </summary>
                <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink">{message.text}</pre>
              </details>
            </li>
          ))}
        </ul>
      )}
    </PageFrame>
  );
}
