import { ShieldAlert } from 'lucide-react';
import { paths } from '#src/config/paths.ts';
import { SETTINGS_SECTIONS } from '#src/config/settings-sections.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { ButtonLink } from './button.tsx';
import { Notice } from './notice.tsx';

/** Whether an error is the server's "this workshop requires two-step sign-in of its staff". */
export function isMfaRequired(error: unknown): boolean {
  return isApiError(error, 'mfa-required');
}

/**
 * What a mentor or admin sees on a workshop page when the workshop requires
 * two-step sign-in of its staff and their account does not have it yet.
 */
export function MfaRequiredNotice() {
  return (
    <Notice tone="caution" role="alert" title="This workshop asks for two-step sign-in">
      <p>
        Mentors and admins here see everyone's work, so the workshop's admins ask them to sign in with a code from their phone as
        well as their password. Turn it on for your account and come back: it takes about two minutes.
      </p>
      <ButtonLink
        variant="primary"
        className="mt-3"
        to={paths.settings.getHref(SETTINGS_SECTIONS.twoStep)}
        icon={<ShieldAlert aria-hidden className="size-4" />}
      >
        Set up two-step sign-in
      </ButtonLink>
    </Notice>
  );
}
