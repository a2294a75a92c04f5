import { CircleCheck, CircleAlert, Info, TriangleAlert, type LucideIcon } from 'lucide-react';
import type { ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

export type NoticeTone = 'info' | 'sound' | 'caution' | 'danger';

const tones: Record<NoticeTone, { icon: LucideIcon; classes: string; word: string }> = {
  info: { icon: Info, classes: 'border-info-line bg-info-bg text-info', word: 'Note' },
  sound: { icon: CircleCheck, classes: 'border-sound-line bg-sound-bg text-sound', word: 'Done' },
  caution: { icon: TriangleAlert, classes: 'border-caution-line bg-caution-bg text-caution', word: 'Caution' },
  danger: { icon: CircleAlert, classes: 'border-danger-line bg-danger-bg text-danger', word: 'Problem' },
};

type NoticeProps = {
  tone?: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  /** "alert" for errors that appear after an action, so screen readers announce them. */
  role?: 'alert' | 'status';
  className?: string;
};

/** A message box with an icon and a word for its tone: never colour alone. */
export function Notice({ tone = 'info', title, children, role, className }: NoticeProps) {
  const { icon: Icon, classes, word } = tones[tone];
  return (
    <div role={role} className={cn('flex gap-3 rounded-md border p-3 lg:p-4', classes, className)}>
      <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
      <div className="flex flex-col gap-1 text-body">
        {title ? (
          <p className="font-semibold">
            <span className="sr-only">{word}: </span>
            {title}
          </p>
        ) : (
          <span className="sr-only">{word}:</span>
        )}
        {children ? <div className="text-ink">{children}</div> : null}
      </div>
    </div>
  );
}
