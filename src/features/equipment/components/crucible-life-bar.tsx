import { Archive, CircleCheck, OctagonAlert, TriangleAlert } from 'lucide-react';
import type { Crucible } from '#shared/heats/equipment-schemas.ts';
import { cn } from '#src/lib/cn.ts';
import { formatDate } from '#src/lib/format.ts';

const STATUS = {
  ok: { icon: CircleCheck, word: 'in good standing', tone: 'text-sound', bar: 'bg-sound-line' },
  'near-limit': { icon: TriangleAlert, word: 'near its limit', tone: 'text-caution', bar: 'bg-caution-line' },
  'past-limit': { icon: OctagonAlert, word: 'at or past its limit: retire it', tone: 'text-danger', bar: 'bg-danger-line' },
  retired: { icon: Archive, word: 'retired', tone: 'text-ink-muted', bar: 'bg-line-strong' },
} as const;

/**
 * A crucible's cycles against its warning and limit: a bar for the eye,
 * and the same facts in words (with an icon for the status), so the bar is
 * never the only cue.
 */
export function CrucibleLifeBar({ crucible }: { crucible: Pick<Crucible, 'cycleCount' | 'warnAt' | 'limitAt' | 'status' | 'retiredOn'> }) {
  const { cycleCount, warnAt, limitAt, status } = crucible;
  const look = STATUS[status];
  const Icon = look.icon;
  const filled = Math.min(cycleCount / limitAt, 1) * 100;
  const warnMark = Math.min(warnAt / limitAt, 1) * 100;
  return (
    <div className="flex flex-col gap-1.5">
      <p className="flex flex-wrap items-center gap-x-2 text-body text-ink">
        <span>
          <span className="figures font-semibold">{cycleCount}</span> of <span className="figures">{limitAt}</span> heats
        </span>
        <span className={cn('inline-flex items-center gap-1 font-semibold', look.tone)}>
          <Icon aria-hidden className="size-4" />
          <span className="text-ink">
            {status === 'retired' && crucible.retiredOn ? `retired on ${formatDate(crucible.retiredOn)}` : look.word}
          </span>
        </span>
      </p>
      <div aria-hidden className="relative h-3 w-full overflow-hidden rounded-full border border-line-strong bg-surface-sunken">
        <div className={cn('h-full', look.bar)} style={{ width: `${filled}%` }} />
        <div className="absolute inset-y-0 w-0.5 bg-ink" style={{ left: `${warnMark}%` }} />
      </div>
      <p className="text-caption text-ink-muted">
        Warn at <span className="figures">{warnAt}</span>, limit <span className="figures">{limitAt}</span> (the workshop’s figures for this material).
      </p>
    </div>
  );
}
