import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { WORKSHOP_KIND_LABELS, WORKSHOP_KINDS, workshopCreateSchema, type Workshop } from '#shared/workshops/workshop-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { useCreateWorkshop } from '../api/use-create-workshop.ts';
import { rememberWorkshop } from '../lib/remembered-workshop.ts';

type Values = z.input<typeof workshopCreateSchema>;

/** A new workshop; whoever creates it is its admin. */
export function CreateWorkshopForm({ onCreated }: { onCreated: (workshop: Workshop) => void }) {
  const createWorkshop = useCreateWorkshop();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof workshopCreateSchema>>({
    resolver: zodResolver(workshopCreateSchema),
    defaultValues: { name: '', kind: 'makerspace' },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    createWorkshop.mutate(values, {
      onSuccess: (workshop) => {
        rememberWorkshop(workshop.id);
        onCreated(workshop);
      },
      onError: (error) => setProblem(applyServerErrors(error, form.setError, ['name', 'kind'])),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-5">
      {problem ? (
        <Notice tone="danger" role="alert" title="Workshop not created">
          {problem}
        </Notice>
      ) : null}
      <TextField label="Workshop name" hint="As your members know it, e.g. the class or the shop's name." autoComplete="organization" error={errors.name?.message} {...form.register('name')} />
      <SelectField label="What kind of workshop" error={errors.kind?.message} {...form.register('kind')}>
        {WORKSHOP_KINDS.map((kind) => (
          <option key={kind} value={kind}>
            {WORKSHOP_KIND_LABELS[kind]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="primary" pending={createWorkshop.isPending} pendingLabel="Creating…">
        Create the workshop
      </Button>
    </form>
  );
}
