import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import type { z } from 'zod';
import { ALLOYS, findAlloy, formatMass, heatTreatmentPlan, tempersFor, type MassUnit, type Temper, type TemperatureUnit } from '#shared/domain/index.ts';
import { heatTreatmentCreateSchema, type CandidateCasting } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { paths } from '#src/config/paths.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatDate } from '#src/lib/format.ts';
import { useCreateHeatTreatment } from '../api/use-create-heat-treatment.ts';
import { PlanSteps } from './plan-steps.tsx';

type Values = z.input<typeof heatTreatmentCreateSchema>;
const FIELDS = ['alloy', 'temper', 'castingIds', 'oven', 'notes'] as const;

/** Library alloys that have at least one heat-treatment schedule. */
const TREATABLE = ALLOYS.filter((a) => tempersFor(a).length > 0);

const designationOf = (heatAlloy: string) => findAlloy(heatAlloy)?.designation;

type Props = {
  workshopId: string;
  candidates: readonly CandidateCasting[];
  units: { temperatureUnit: TemperatureUnit; massUnit: MassUnit };
};

/**
 * A new plan: the alloy, a temper it accepts (from the trade core's
 * schedules), which of the user's castings of that alloy go in, and the oven.
 * The steps show before anything is saved.
 */
export function PlanForm({ workshopId, candidates, units }: Props) {
  const navigate = useNavigate();
  const create = useCreateHeatTreatment(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const firstTreatable = candidates.map((c) => designationOf(c.heatAlloy)).find((d) => d && TREATABLE.some((a) => a.designation === d));
  const startAlloy = firstTreatable ?? TREATABLE[0]?.designation ?? '';
  const form = useForm<Values, unknown, z.output<typeof heatTreatmentCreateSchema>>({
    resolver: zodResolver(heatTreatmentCreateSchema),
    defaultValues: { alloy: startAlloy, temper: tempersFor(findAlloy(startAlloy)!)[0], castingIds: [], oven: '', notes: '' },
  });
  const { errors } = form.formState;
  const alloyName = useWatch({ control: form.control, name: 'alloy' });
  const temper = useWatch({ control: form.control, name: 'temper' }) as Temper;
  const alloy = findAlloy(alloyName);
  const tempers = alloy ? tempersFor(alloy) : [];
  const plan = alloy && tempers.includes(temper) ? heatTreatmentPlan(alloy, temper) : undefined;
  const matching = candidates.filter((c) => designationOf(c.heatAlloy) === alloy?.designation);

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    create.mutate(values, {
      onSuccess: (detail) => navigate(paths.heatTreatmentDetail.getHref(workshopId, detail.id)),
      onError: (error) => setProblem(applyServerErrors(error, form.setError, FIELDS)),
    });
  });

  const alloyField = form.register('alloy', {
    onChange: (e: { target: { value: string } }) => {
      const next = findAlloy(e.target.value);
      form.setValue('temper', next ? tempersFor(next)[0] : 'T6');
      form.setValue('castingIds', []);
    },
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Plan a heat treatment" className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="flex flex-col gap-4">
        {problem ? (
          <Notice tone="danger" role="alert" title="Plan not saved">
            {problem}
          </Notice>
        ) : null}
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField label="Alloy" error={errors.alloy?.message} {...alloyField}>
            {TREATABLE.map((a) => (
              <option key={a.designation} value={a.designation}>
                {a.designation}
              </option>
            ))}
          </SelectField>
          <SelectField label="Temper" error={errors.temper?.message} hint="The tempers this alloy’s schedules give." {...form.register('temper')}>
            {tempers.map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </SelectField>
        </div>
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-body font-medium text-ink">Castings</legend>
          {matching.length === 0 ? (
            <p className="text-body text-ink-muted">
              None of your castings come from a {alloy?.designation ?? 'heat of this alloy'} heat. Log the heat and its castings first, or pick another
              alloy.
            </p>
          ) : (
            matching.map((c) => (
              <CheckboxField
                key={c.id}
                value={c.id}
                label={
                  <>
                    No. {c.number} from the heat of {formatDate(c.heatPouredAt)}
                    {c.mouldName ? `, ${c.mouldName}` : ''}
                    {c.massG !== null ? <span className="figures">, {formatMass(c.massG, units.massUnit)}</span> : null}
                    {c.casterName ? <span className="text-ink-muted"> · {c.casterName}</span> : null}
                    {c.openPlanIds.length ? <span className="text-ink-muted"> · already in an open plan</span> : null}
                  </>
                }
                {...form.register('castingIds')}
              />
            ))
          )}
          {errors.castingIds ? (
            <p role="alert" className="text-caption font-medium text-danger">
              {errors.castingIds.message ?? 'Check the castings'}
            </p>
          ) : null}
        </fieldset>
        <TextField label="Oven or kiln" hint="The one you will use, so the record says where it was done." error={errors.oven?.message} {...form.register('oven')} />
        <TextField label="Notes" error={errors.notes?.message} {...form.register('notes')} />
        <div>
          <Button type="submit" variant="primary" pending={create.isPending} pendingLabel="Saving the plan…">
            Save the plan
          </Button>
        </div>
      </div>
      <section aria-label="The steps of this plan" className="flex flex-col gap-2">
        <h3 className="text-title font-semibold text-ink">
          {alloy?.designation} {temper}: the steps
        </h3>
        {plan ? (
          <>
            <p className="text-body text-ink-muted">{plan.description}</p>
            <PlanSteps plan={plan} unit={units.temperatureUnit} />
          </>
        ) : (
          <p className="text-body text-ink-muted">Pick a temper to see its steps.</p>
        )}
      </section>
    </form>
  );
}
