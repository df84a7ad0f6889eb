import type { ReactNode } from 'react';
import { Button } from './Button';
import { Dialog, DialogActions } from './Dialog';
import { ErrorNotice } from './ErrorNotice';

export interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  /** 'danger' for actions that remove or lock something. */
  tone?: 'danger' | 'primary';
  pending?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before an action that is hard to undo; the safe choice (Cancel) has focus first. */
export function ConfirmDialog({ open, title, children, confirmLabel, tone = 'danger', pending, error, onConfirm, onCancel }: ConfirmDialogProps) {
  return (
    <Dialog open={open} title={title} onClose={onCancel} role="alertdialog">
      <div className="flex flex-col gap-4 text-sm text-ink-soft">
        {children}
        {error ? <ErrorNotice message={error} /> : null}
      </div>
      <DialogActions>
        <Button data-autofocus variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button variant={tone} pending={pending} onClick={onConfirm}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
