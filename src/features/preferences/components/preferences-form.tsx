import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { displayNameSchema, type CurrentUser } from '#shared/auth/auth-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { ThemePicker, UnitToggles, type ChangePreferences } from './preference-controls.tsx';

const nameSchema = z.object({ displayName: displayNameSchema });
type NameValues = z.infer<typeof nameSchema>;

/** The settings page's own preferences: name, units and theme. */
export function PreferencesForm({ user, onChange, saving }: { user: CurrentUser; onChange: ChangePreferences; saving?: boolean }) {
  const form = useForm<NameValues>({ resolver: zodResolver(nameSchema), values: { displayName: user.displayName } });

  const onSubmit = form.handleSubmit(({ displayName }) =>
    onChange(
      { displayName },
      {
        onSuccess: () => toast.success('Name saved.'),
        onError: (error) => {
          const problem = applyServerErrors(error, form.setError, ['displayName']);
          if (problem) toast.error(`Name not saved: ${problem}`);
        },
      },
    ),
  );

  return (
    <div className="flex flex-col gap-6">
      <Card title="Your name">
        <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4">
          <TextField
            label="Name"
            autoComplete="name"
            hint="Members of your workshops see this name on heats, reports and comments."
            error={form.formState.errors.displayName?.message}
            {...form.register('displayName')}
          />
          <Button type="submit" className="self-start" pending={saving} pendingLabel="Saving…">
            Save name
          </Button>
        </form>
      </Card>
      <Card title="Units" description="Every figure follows these, and each figure shows its unit.">
        <UnitToggles user={user} onChange={onChange} />
      </Card>
      <Card title="Theme">
        <div className="max-w-md">
          <ThemePicker user={user} onChange={onChange} />
        </div>
      </Card>
    </div>
  );
}
