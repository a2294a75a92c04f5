import { useSuspenseQuery } from '@tanstack/react-query';
import type { DefectKindId, TemperatureUnit } from '#shared/domain/index.ts';
import { CircleCheck } from 'lucide-react';
import { diagnosisQueries } from '../api/diagnosis-queries.ts';
import { useRecordCondition } from '../api/use-record-condition.ts';
import { RecordConditionField } from './record-condition-field.tsx';

type QuickCheckQuestionsProps = {
  workshopId: string;
  heatId: string;
  castingId: string;
  kinds: readonly DefectKindId[];
  temperatureUnit: TemperatureUnit;
  heatFormHref: string;
  onRecorded?: () => unknown;
};

/** Only the few fields that matter most for the marked kinds; each saves on its own and the ranking refetches. */
export function QuickCheckQuestions({ workshopId, heatId, castingId, kinds, temperatureUnit, heatFormHref, onRecorded }: QuickCheckQuestionsProps) {
  const { data } = useSuspenseQuery(diagnosisQueries.questions(workshopId, kinds));
  const { data: diagnosis } = useSuspenseQuery(diagnosisQueries.casting(workshopId, castingId));
  const { data: heat } = useSuspenseQuery(diagnosisQueries.heat(workshopId, heatId));
  const record = useRecordCondition(workshopId, { heatId, castingId }, onRecorded);
  const recorded = diagnosis.input.conditions as Record<string, unknown>;
  return (
    <section aria-labelledby="questions-heading" className="flex flex-col gap-3" data-testid="quick-check-questions">
      <h2 id="questions-heading" className="text-title font-semibold text-ink">
        A few questions
      </h2>
      <p className="text-body text-ink-muted">These matter most for what you marked. Answer what you know; skip the rest.</p>
      <ol className="flex flex-col gap-4">
        {data.questions.map((q) => (
          <li key={q.fields.join('+')} className="flex flex-col gap-2 rounded-md border border-line p-3">
            <p className="font-semibold text-ink">{q.label[0]?.toUpperCase() + q.label.slice(1)}</p>
            {q.fields.map((field) =>
              recorded[field] !== undefined ? (
                <p key={field} className="flex items-center gap-1 text-body text-sound">
                  <CircleCheck aria-hidden className="size-4" /> Recorded
                </p>
              ) : (
                <RecordConditionField
                  key={field}
                  field={field}
                  temperatureUnit={temperatureUnit}
                  context={{ pouredAt: heat.pouredAt }}
                  heatFormHref={heatFormHref}
                  pending={record.isPending}
                  onRecord={(patches) => record.mutateAsync(patches)}
                />
              ),
            )}
          </li>
        ))}
      </ol>
    </section>
  );
}
