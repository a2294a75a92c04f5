import { useState } from 'react';
import { formatNumber } from '#shared/domain/index.ts';
import {
  HARDNESS_SCALES,
  HARDNESS_SCALE_INFO,
  type HardnessScale,
  type HeatTreatmentDetail,
} from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { useAddHardness, useRemoveHardness } from '../api/use-heat-treatment-record.ts';
import { parseNumber } from '../lib/record-input.ts';

const th = 'border-b border-line-strong px-2 py-1.5 text-left text-caption font-semibold text-ink-muted';
const td = 'border-b border-line px-2 py-1.5 text-body text-ink';

/** Hardness after treatment, each reading with its scale (HB, HRB, HRE, HV and Webster B numbers do not compare). */
export function HardnessPanel({ workshopId, plan, mayRecord }: { workshopId: string; plan: HeatTreatmentDetail; mayRecord: boolean }) {
  const add = useAddHardness(workshopId, plan.id);
  const remove = useRemoveHardness(workshopId, plan.id);
  const [scale, setScale] = useState<HardnessScale>('HB');
  const [value, setValue] = useState('');
  const [castingId, setCastingId] = useState('');
  const [location, setLocation] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const castingLabel = (id: string | null) => {
    const c = plan.castings.find((x) => x.id === id);
    return c ? `No. ${c.number}` : '—';
  };

  const submit = () => {
    setProblem(null);
    const v = parseNumber(value);
    if (v === null || v === 'invalid') {
      setProblem('Type the reading as a number.');
      return;
    }
    add.mutate(
      { scale, value: v, castingId: castingId || null, locationNote: location.trim() || null },
      {
        onSuccess: () => {
          setValue('');
          setLocation('');
        },
        onError: (error) => setProblem(isApiError(error) && error.issues.length ? error.issues.map((i) => i.message).join(' ') : errorMessage(error)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-3">
      {plan.hardness.length ? (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse">
            <caption className="sr-only">Hardness readings</caption>
            <thead>
              <tr>
                <th scope="col" className={th}>Reading</th>
                <th scope="col" className={th}>Casting</th>
                <th scope="col" className={th}>Where</th>
                <th scope="col" className={th}>Measured</th>
                {mayRecord ? <th scope="col" className={th}><span className="sr-only">Remove</span></th> : null}
              </tr>
            </thead>
            <tbody>
              {plan.hardness.map((h) => (
                <tr key={h.id}>
                  <th scope="row" className={`${td} figures font-normal`}>
                    {formatNumber(h.value, h.value % 1 === 0 ? 0 : 1)} {HARDNESS_SCALE_INFO[h.scale].label}
                  </th>
                  <td className={td}>{castingLabel(h.castingId)}</td>
                  <td className={td}>{h.locationNote ?? '—'}</td>
                  <td className={td}>{formatDateTime(h.measuredAt)}</td>
                  {mayRecord ? (
                    <td className={td}>
                      <Button size="sm" variant="quiet" onClick={() => remove.mutate(h.id)} disabled={remove.isPending}>
                        Remove<span className="sr-only"> the reading of {h.value}</span>
                      </Button>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p className="text-body text-ink-muted">No hardness readings yet. A reading or two per casting after ageing shows whether the treatment took.</p>
      )}
      {mayRecord ? (
        <fieldset className="grid gap-3 rounded-md bg-surface-sunken p-3 sm:grid-cols-2 sm:items-end">
          <legend className="sr-only">Add a hardness reading</legend>
          <SelectField label="Scale" value={scale} onChange={(e) => setScale(e.target.value as HardnessScale)}>
            {HARDNESS_SCALES.map((s) => (
              <option key={s} value={s}>
                {HARDNESS_SCALE_INFO[s].label}
              </option>
            ))}
          </SelectField>
          <TextField label="Reading" inputMode="decimal" value={value} onChange={(e) => setValue(e.target.value)} hint={`${HARDNESS_SCALE_INFO[scale].min}–${HARDNESS_SCALE_INFO[scale].max}`} />
          <SelectField label="Casting" value={castingId} onChange={(e) => setCastingId(e.target.value)}>
            <option value="">The load in general</option>
            {plan.castings.map((c) => (
              <option key={c.id} value={c.id}>
                No. {c.number}
                {c.mouldName ? `, ${c.mouldName}` : ''}
              </option>
            ))}
          </SelectField>
          <TextField label="Where on the casting" value={location} onChange={(e) => setLocation(e.target.value)} />
          <div className="sm:col-span-2">
            {problem ? (
              <Notice tone="danger" role="alert" title="Reading not added" className="mb-3">
                {problem}
              </Notice>
            ) : null}
            <Button onClick={submit} pending={add.isPending} pendingLabel="Adding…">
              Add the reading
            </Button>
          </div>
        </fieldset>
      ) : null}
    </div>
  );
}
