import { X } from 'lucide-react';
import { useCallback, useId, type KeyboardEvent, type ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

type ModalDialogProps = {
  title: ReactNode;
  /** Esc, the Close button and a tap on the backdrop all call this. */
  onClose: () => void;
  children: ReactNode;
  /** Visually hide the heading where the content already says it (it stays the dialog's name). */
  hideTitle?: boolean;
  className?: string;
  onKeyDown?: (event: KeyboardEvent<HTMLDialogElement>) => void;
  closeLabel?: string;
};

/**
 * A modal <dialog>, mounted only while open. showModal() gives focus
 * trapping, Escape and the backdrop. Focus starts on the element marked
 * `data-autofocus` and goes back to the opener when it closes. On a phone it rises from the bottom, on a desktop it sits
 * in the middle.
 */
export function ModalDialog({ title, onClose, children, hideTitle, className, onKeyDown, closeLabel = 'Close' }: ModalDialogProps) {
  const titleId = useId();
  const attach = useCallback((dialog: HTMLDialogElement | null) => {
    if (!dialog) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (!dialog.open) {
      if (typeof dialog.showModal === 'function') dialog.showModal();
      else dialog.setAttribute('open', '');
      // showModal focuses the first control (the Close button); start where the work is.
      dialog.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    }
    // Unmounting an open dialog does not hand focus back; do it, if the opener is still there.
    return () => {
      if (opener?.isConnected) opener.focus();
    };
  }, []);
  return (
    <dialog
      ref={attach}
      aria-labelledby={titleId}
      onCancel={(event) => {
        // Escape: let React unmount it rather than the browser closing it under React.
        event.preventDefault();
        onClose();
      }}
      onClick={(event) => {
        if (event.target === event.currentTarget) onClose();
      }}
      onKeyDown={onKeyDown}
      className={cn(
        'fixed inset-x-0 top-auto bottom-0 m-0 max-h-[92dvh] w-full max-w-none overflow-auto rounded-t-lg border border-line bg-surface-raised p-0 text-ink',
        'lg:inset-0 lg:m-auto lg:max-h-[85dvh] lg:w-[36rem] lg:rounded-lg',
        className,
      )}
    >
      <div className="sticky top-0 z-10 flex items-center justify-between gap-3 border-b border-line bg-surface-raised px-4 py-2">
        <h2 id={titleId} className={hideTitle ? 'sr-only' : 'text-title font-semibold'}>
          {title}
        </h2>
        <button
          type="button"
          onClick={onClose}
          className="ml-auto flex min-h-12 min-w-12 items-center justify-center gap-2 rounded-md px-3 text-body font-medium lg:min-h-10"
        >
          <X aria-hidden className="size-5" />
          {closeLabel}
        </button>
      </div>
      {children}
    </dialog>
  );
}
