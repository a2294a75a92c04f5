import { CircleAlert } from 'lucide-react';
import type { ReactNode } from 'react';

/** Ids for a field's hint and error, for aria-describedby. */
export function describedBy(id: string, hint?: ReactNode, error?: string) {
  return [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
}

export function FieldHint({ id, children }: { id: string; children?: ReactNode }) {
  if (!children) return null;
  return (
    <p id={`${id}-hint`} className="text-caption text-ink-muted">
      {children}
    </p>
  );
}

/** The error sits under its field, with an icon so colour is not the only cue. */
export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={`${id}-error`} className="flex items-start gap-1.5 text-caption font-medium text-danger">
      <CircleAlert aria-hidden className="mt-0.5 size-4 shrink-0" />
      <span>{message}</span>
    </p>
  );
}

export const controlClasses =
  'block w-full min-h-12 rounded-md border border-line-strong bg-surface-raised px-3 text-body text-ink ' +
  'placeholder:text-ink-muted lg:min-h-10 aria-invalid:border-danger-line aria-invalid:border-2';
