import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { crucibleNoteCreateSchema, type CrucibleDetail, type CrucibleNoteCreateInput } from '#shared/heats/equipment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatDate } from '#src/lib/format.ts';
import { useAddCrucibleNote } from '../api/use-add-crucible-note.ts';

/** Today in the device's own calendar, as the date input shows it. */
const today = () => {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
};

/** The crucible's condition notes, newest first, and a form to add what you saw today. */
export function CrucibleNotes({ workshopId, crucible, canAdd }: { workshopId: string; crucible: CrucibleDetail; canAdd: boolean }) {
  const addNote = useAddCrucibleNote(workshopId, crucible.id);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CrucibleNoteCreateInput>({ resolver: zodResolver(crucibleNoteCreateSchema), defaultValues: { note: '', notedOn: today() } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    setProblem(null);
    addNote.mutate(values, {
      onSuccess: () => form.reset({ note: '', notedOn: today() }),
      onError: (error) => setProblem(applyServerErrors(error, form.setError, ['note', 'notedOn'])),
    });
  });

  return (
    <div className="flex flex-col gap-4">
      {crucible.notes.length === 0 ? (
        <p className="text-body text-ink-muted">No condition notes yet. Note what you see at each inspection: hairline cracks, thinning walls, glaze or erosion at the rim.</p>
      ) : (
        <ol className="flex flex-col divide-y divide-line" aria-label="Condition notes">
          {crucible.notes.map((n) => (
            <li key={n.id} className="flex flex-col gap-1 py-3">
              <p className="text-caption text-ink-muted">
                <time dateTime={n.notedOn}>{formatDate(n.notedOn)}</time>
                {n.authorName ? ` · ${n.authorName}` : ''}
              </p>
              <p className="max-w-prose text-body whitespace-pre-line text-ink">{n.note}</p>
            </li>
          ))}
        </ol>
      )}
      {canAdd ? (
        <form noValidate aria-label="Add a condition note" onSubmit={submit} className="flex flex-col gap-3 rounded-md border border-line bg-surface p-4">
          {problem ? (
            <Notice tone="danger" role="alert" title="Note not saved">
              {problem}
            </Notice>
          ) : null}
          <TextareaField label="What you saw" rows={3} error={errors.note?.message} {...form.register('note')} />
          <TextField label="Seen on" type="date" error={errors.notedOn?.message} {...form.register('notedOn')} />
          <Button type="submit" className="self-start" pending={addNote.isPending} pendingLabel="Saving…">
            Add the note
          </Button>
        </form>
      ) : null}
    </div>
  );
}
