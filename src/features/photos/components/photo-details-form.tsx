import { useId, useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import { photoUpdateSchema, type Photo } from '#shared/photos/photo-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { controlClasses } from '#src/components/ui/field-parts.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { cn } from '#src/lib/cn.ts';
import { useUpdatePhoto } from '../api/use-update-photo.ts';

/** The owner names the photo and writes notes on it. */
export function PhotoDetailsForm({ workshopId, photo, onDone }: { workshopId: string; photo: Photo; onDone: () => void }) {
  const notesId = useId();
  const update = useUpdatePhoto(workshopId, photo.id);
  const [title, setTitle] = useState(photo.title ?? '');
  const [notes, setNotes] = useState(photo.notes ?? '');
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = photoUpdateSchema.safeParse({ title: title.trim() || null, notes: notes.trim() || null });
    if (!parsed.success) {
      setProblem(parsed.error.issues[0]?.message ?? 'Check the title and notes.');
      return;
    }
    setProblem(null);
    update.mutate(parsed.data, {
      onSuccess: () => {
        toast.success('Photo details saved.');
        onDone();
      },
      onError: (error) => setProblem(errorMessage(error)),
    });
  };

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-3">
      {problem ? (
        <Notice tone="danger" role="alert" title="Not saved">
          {problem}
        </Notice>
      ) : null}
      <TextField label="Title" value={title} maxLength={120} onChange={(e) => setTitle(e.target.value)} data-autofocus />
      <div className="flex flex-col gap-1.5">
        <label htmlFor={notesId} className="text-body font-medium text-ink">
          Notes
        </label>
        <textarea id={notesId} value={notes} rows={3} maxLength={4000} onChange={(e) => setNotes(e.target.value)} className={cn(controlClasses, 'py-2')} />
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={update.isPending} pendingLabel="Saving…">
          Save details
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
