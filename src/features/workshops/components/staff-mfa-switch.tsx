import type { Workshop } from '#shared/workshops/workshop-schemas.ts';
import { Card } from '#src/components/ui/card.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { SETTINGS_SECTIONS } from '#src/config/settings-sections.ts';
import { useUpdateWorkshop } from '../api/use-update-workshop.ts';

type StaffMfaSwitchProps = {
  workshop: Workshop;
  /** Whether the admin looking at it has two-step sign-in on (they cannot require it otherwise). */
  adminHasMfa: boolean;
};

/**
 * Members page (admins): require two-step sign-in of mentors and admins.
 * Turning it on is offered only once the admin's own account has it, so the
 * admin cannot lock themselves out; the server refuses it too.
 */
export function StaffMfaSwitch({ workshop, adminHasMfa }: StaffMfaSwitchProps) {
  const update = useUpdateWorkshop(workshop.id);
  const on = update.isPending && update.variables ? update.variables.requireMfaForStaff : workshop.requireMfaForStaff;
  const blocked = !on && !adminHasMfa;

  return (
    <Card
      title="Two-step sign-in for staff"
      description="Mentors and admins see every member's heats, photos and reports. With this on, they must sign in with a code from their phone as well as their password; students and casters are not asked."
    >
      <div className="flex max-w-xl flex-col gap-3">
        <CheckboxField
          label="Require two-step sign-in for mentors and admins"
          checked={on}
          disabled={blocked || update.isPending}
          onChange={(event) => update.mutate({ requireMfaForStaff: event.currentTarget.checked })}
          hint={
            blocked ? (
              <>
                Turn on two-step sign-in for your own account first, so this cannot lock you out:{' '}
                <TextLink to={paths.settings.getHref(SETTINGS_SECTIONS.twoStep)}>set it up in Settings</TextLink>.
              </>
            ) : on ? (
              'Mentors and admins without it see a message asking them to set it up, and cannot open this workshop until they do.'
            ) : undefined
          }
        />
        {update.isError ? (
          <Notice tone="danger" role="alert" title="Not changed">
            {update.error.message}
          </Notice>
        ) : null}
      </div>
    </Card>
  );
}
