import { useState, type ReactNode } from 'react';
import { Button } from '#src/components/ui/button.tsx';

type ConfirmInlineProps = {
  /** The button that asks, e.g. "Delete". */
  trigger: ReactNode;
  triggerIcon?: ReactNode;
  /** The question, e.g. "Delete Ingot tray?" */
  question: string;
  confirmLabel: string;
  pending?: boolean;
  danger?: boolean;
  onConfirm: () => void;
};

/** A destructive action that asks once, in place, before it runs (no modal to lose on a phone). */
export function ConfirmInline({ trigger, triggerIcon, question, confirmLabel, pending, danger = true, onConfirm }: ConfirmInlineProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button size="sm" variant="quiet" icon={triggerIcon} onClick={() => setAsking(true)}>
        {trigger}
      </Button>
    );
  }
  return (
    <div role="group" aria-label={question} className="flex flex-wrap items-center gap-2">
      <span className="text-caption text-ink">{question}</span>
      <Button size="sm" variant={danger ? 'danger' : 'secondary'} pending={pending} pendingLabel="Working…" onClick={onConfirm}>
        {confirmLabel}
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setAsking(false)}>
        Keep it
      </Button>
    </div>
  );
}
