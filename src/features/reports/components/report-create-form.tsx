import { useState, type FormEvent } from 'react';
import type { Photo } from '#shared/photos/photo-schemas.ts';
import { reportCreateSchema, type ReportDetail } from '#shared/reports/report-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { useCreateReport } from '../api/report-mutations.ts';

type ReportCreateFormProps = {
  workshopId: string;
  castingId: string;
  photos: readonly Pick<Photo, 'id' | 'title' | 'marks'>[];
  mentors: readonly { userId: string; displayName: string }[];
  defaultTitle?: string;
  onCreated: (report: ReportDetail) => void;
};

/** Ask a mentor: a draft report on this casting, with the photos it is about. */
export function ReportCreateForm({ workshopId, castingId, photos, mentors, defaultTitle = '', onCreated }: ReportCreateFormProps) {
  const create = useCreateReport(workshopId);
  const [title, setTitle] = useState(defaultTitle);
  const [question, setQuestion] = useState('');
  const [photoIds, setPhotoIds] = useState<string[]>(() => photos.map((p) => p.id));
  const [mentorId, setMentorId] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = reportCreateSchema.safeParse({ castingId, title, question, photoIds, requestedMentorId: mentorId || null });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    create.mutate(parsed.data, { onSuccess: onCreated });
  };

  return (
    <form onSubmit={submit} aria-label="Ask a mentor" className="flex flex-col gap-3">
      <TextField label="Title" value={title} onChange={(e) => setTitle(e.target.value)} error={errors.title} placeholder="Pinholes all over the top face" />
      <TextareaField label="Your question" rows={4} value={question} onChange={(e) => setQuestion(e.target.value)} error={errors.question} hint="What you saw, what you tried, what you want to know." />
      {photos.length > 1 ? (
        <fieldset className="flex flex-col gap-1">
          <legend className="font-medium text-ink">Photos</legend>
          {photos.map((p, i) => (
            <CheckboxField
              key={p.id}
              label={`${p.title ?? `Photo ${i + 1}`} (${p.marks.length} ${p.marks.length === 1 ? 'mark' : 'marks'})`}
              checked={photoIds.includes(p.id)}
              onChange={() => setPhotoIds((ids) => (ids.includes(p.id) ? ids.filter((x) => x !== p.id) : [...ids, p.id]))}
            />
          ))}
        </fieldset>
      ) : null}
      {mentors.length > 0 ? (
        <SelectField label="Ask a mentor in particular" hint="Your assigned mentors see it anyway." value={mentorId} onChange={(e) => setMentorId(e.target.value)}>
          <option value="">My mentors</option>
          {mentors.map((m) => (
            <option key={m.userId} value={m.userId}>
              {m.displayName}
            </option>
          ))}
        </SelectField>
      ) : null}
      {create.error ? (
        <Notice tone="danger" role="alert" title="The report was not started">
          <p>{create.error.message}</p>
        </Notice>
      ) : null}
      <Button type="submit" variant="primary" pending={create.isPending} pendingLabel="Starting…" className="self-start">
        Start the report
      </Button>
    </form>
  );
}
