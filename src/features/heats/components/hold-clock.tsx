import { Flame, Timer } from 'lucide-react';
import { useFormContext, useWatch } from 'react-hook-form';
import { formatNumber } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import type { HeatFormValues } from '../lib/heat-form-values.ts';
import { localInputOf } from '../lib/local-time.ts';

/**
 * The hold-time clock: one press stamps the melt start, another the pour,
 * and the minutes in between count up while the metal is in the furnace.
 * The times stay editable for a heat logged after the fact.
 */
export function HoldClock({ holdMin, clockRunning }: { holdMin: number | null; clockRunning: boolean }) {
  const { register, setValue, formState } = useFormContext<HeatFormValues>();
  const [meltStartedAt, pouredAt] = useWatch<HeatFormValues, ['meltStartedAt', 'pouredAt']>({ name: ['meltStartedAt', 'pouredAt'] });
  const stamp = (field: 'meltStartedAt' | 'pouredAt') =>
    setValue(field, localInputOf(new Date()), { shouldDirty: true, shouldValidate: formState.isSubmitted });

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2">
        {meltStartedAt ? null : (
          <Button className="min-h-14" icon={<Flame aria-hidden className="size-5" />} onClick={() => stamp('meltStartedAt')}>
            Melt started
          </Button>
        )}
        {pouredAt ? null : (
          <Button className="min-h-14" icon={<Timer aria-hidden className="size-5" />} onClick={() => stamp('pouredAt')}>
            Poured
          </Button>
        )}
      </div>
      <div className="flex flex-col gap-0.5 rounded-md bg-surface-sunken px-3 py-2" role="group" aria-label="Hold time">
        <span className="text-caption font-medium text-ink-muted">{clockRunning ? 'In the furnace for' : 'Hold time'}</span>
        {holdMin === null ? (
          <span className="text-body text-ink-muted">
            {meltStartedAt ? 'Stamp the pour, or enter its time' : 'Press “Melt started” when the charge goes in'}
          </span>
        ) : (
          <span className="figures text-display font-semibold text-ink" aria-live={clockRunning ? 'off' : 'polite'}>
            {formatNumber(holdMin, 0)} min
          </span>
        )}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Melt started at"
          type="datetime-local"
          hint="Optional; gives the hold time"
          error={formState.errors.meltStartedAt?.message}
          {...register('meltStartedAt')}
        />
        <TextField label="Poured at" type="datetime-local" error={formState.errors.pouredAt?.message} {...register('pouredAt')} />
      </div>
    </div>
  );
}
