import { Printer } from 'lucide-react';
import { useState } from 'react';
import { findAlloy, type TemperatureUnit } from '#shared/domain/index.ts';
import type { HeatTreatmentDetail } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { Button, ButtonLink } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate, formatDateTime } from '#src/lib/format.ts';
import { useAddPhoto, useUpdateHeatTreatment } from '../api/use-heat-treatment-record.ts';
import { HardnessPanel } from './hardness-panel.tsx';
import { HeatTreatmentCautions } from './heat-treatment-cautions.tsx';
import { StateBadge } from './heat-treatment-list.tsx';
import { StepRecord } from './step-record.tsx';

/** A photo of one of the plan's castings that could be linked to the outcome. */
export type PhotoOption = { id: string; castingId: string; label: string };

type Props = {
  workshopId: string;
  plan: HeatTreatmentDetail;
  unit: TemperatureUnit;
  /** Whether the reader may record (the plan's caster, or an admin); the server decides in the end. */
  mayRecord: boolean;
  photoOptions: readonly PhotoOption[];
};

/** The plan beside what was recorded, step by step, then the outcome: hardness and photos. */
export function HeatTreatmentRecordView({ workshopId, plan, unit, mayRecord, photoOptions }: Props) {
  const update = useUpdateHeatTreatment(workshopId, plan.id);
  const addPhoto = useAddPhoto(workshopId, plan.id);
  const [photoId, setPhotoId] = useState('');
  const alloy = findAlloy(plan.plan.designation);
  const { comparison } = plan;
  const unlinked = photoOptions.filter((o) => !plan.photos.some((p) => p.id === o.id));

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="flex min-w-0 flex-col gap-6">
        {comparison.worst ? (
          <Notice tone={comparison.worst === 'danger' ? 'danger' : 'caution'} title={`${comparison.deviations.length} deviation${comparison.deviations.length === 1 ? '' : 's'} from the plan`}>
            <p>Each is listed under its step with the plan’s value beside the recorded one.</p>
          </Notice>
        ) : comparison.steps.every((s) => s.status === 'as_planned' && s.missing.length === 0) ? (
          <Notice tone="sound" title="Every step recorded, as planned" />
        ) : null}
        <section aria-labelledby="ht-steps" className="flex flex-col gap-3">
          <h2 id="ht-steps" className="text-title font-semibold text-ink">
            Plan and record
          </h2>
          <ol className="flex flex-col gap-4">
            {comparison.steps.map((step) => (
              <StepRecord key={step.index} workshopId={workshopId} planId={plan.id} step={step} unit={unit} mayRecord={mayRecord} />
            ))}
          </ol>
        </section>
        <Card title="Hardness" headingLevel={2}>
          <HardnessPanel workshopId={workshopId} plan={plan} mayRecord={mayRecord} />
        </Card>
        <Card title="Photos of the outcome" headingLevel={2} description="Photos of these castings after treatment: blisters, distortion, a cut section.">
          {plan.photos.length ? (
            <ul className="mb-3 flex flex-wrap gap-3">
              {plan.photos.map((p) => (
                <li key={p.id}>
                  <TextLink to={paths.photo.getHref(workshopId, p.id)}>
                    <img src={p.thumbUrl} alt="Photo of a treated casting" width={96} height={96} className="size-24 rounded object-cover" />
                  </TextLink>
                </li>
              ))}
            </ul>
          ) : (
            <p className="mb-3 text-body text-ink-muted">No photos linked yet.</p>
          )}
          {mayRecord && unlinked.length ? (
            <div className="flex flex-wrap items-end gap-3">
              <SelectField label="Link a photo" value={photoId} onChange={(e) => setPhotoId(e.target.value)} className="min-w-64">
                <option value="">Choose a photo</option>
                {unlinked.map((o) => (
                  <option key={o.id} value={o.id}>
                    {o.label}
                  </option>
                ))}
              </SelectField>
              <Button disabled={!photoId} pending={addPhoto.isPending} pendingLabel="Linking…" onClick={() => addPhoto.mutate(photoId, { onSuccess: () => setPhotoId('') })}>
                Link
              </Button>
            </div>
          ) : null}
        </Card>
      </div>
      <aside className="flex flex-col gap-4">
        <Card title="This plan" headingLevel={2}>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-body">
            <dt className="text-ink-muted">State</dt>
            <dd>
              <StateBadge state={plan.state} />
            </dd>
            <dt className="text-ink-muted">Oven</dt>
            <dd>{plan.oven}</dd>
            <dt className="text-ink-muted">Caster</dt>
            <dd>{plan.casterName}</dd>
            <dt className="text-ink-muted">Planned</dt>
            <dd>{formatDateTime(plan.createdAt)}</dd>
          </dl>
          <h3 className="mt-3 text-body font-semibold text-ink">Castings</h3>
          <ul className="text-body">
            {plan.castings.map((c) => (
              <li key={c.id}>
                <TextLink to={paths.casting.getHref(workshopId, c.heatId, c.id)}>
                  No. {c.number} from the heat of {formatDate(c.heatPouredAt)}
                </TextLink>
                {c.mouldName ? ` (${c.mouldName})` : ''}
              </li>
            ))}
          </ul>
          {plan.notes ? <p className="mt-3 text-body">{plan.notes}</p> : null}
          <div className="mt-4 flex flex-wrap gap-3">
            <ButtonLink to={paths.heatTreatmentSheet.getHref(workshopId, plan.id)} variant="primary" icon={<Printer aria-hidden className="size-4" />}>
              Oven sheet
            </ButtonLink>
            {mayRecord ? (
              <Button
                onClick={() => update.mutate({ state: plan.state === 'done' ? 'in_progress' : 'done' })}
                pending={update.isPending}
                pendingLabel="Saving…"
              >
                {plan.state === 'done' ? 'Reopen the record' : 'Mark as done'}
              </Button>
            ) : null}
          </div>
          {!mayRecord ? <p className="mt-3 text-caption text-ink-muted">{plan.casterName} or an admin records this plan; you can read it.</p> : null}
        </Card>
        <HeatTreatmentCautions unit={unit} solidusC={alloy?.solidusC} designation={plan.alloy} hasQuench={plan.plan.steps.some((s) => s.kind === 'quench')} />
      </aside>
    </div>
  );
}
