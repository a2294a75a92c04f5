import type { ReactNode } from 'react';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { ModalDialog } from './modal-dialog.tsx';

type ConfirmDialogProps = {
  title: string;
  children: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  pending?: boolean;
  problem?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
};

/** Asks before something that cannot be undone. Focus starts on the safe choice. */
export function ConfirmDialog({ title, children, confirmLabel, cancelLabel = 'Keep it', pending, problem, onConfirm, onCancel }: ConfirmDialogProps) {
  return (
    <ModalDialog title={title} onClose={onCancel} className="lg:w-[28rem]">
      <div className="flex flex-col gap-4 p-4">
        {problem ? (
          <Notice tone="danger" role="alert" title="Not done">
            {problem}
          </Notice>
        ) : null}
        <div className="text-body text-ink">{children}</div>
        <div className="flex flex-wrap justify-end gap-3">
          <Button onClick={onCancel} data-autofocus>
            {cancelLabel}
          </Button>
          <Button variant="danger" onClick={onConfirm} pending={pending} pendingLabel="Deleting…">
            {confirmLabel}
          </Button>
        </div>
      </div>
    </ModalDialog>
  );
}
