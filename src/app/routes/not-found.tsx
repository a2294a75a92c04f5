import { ButtonLink } from '#src/components/ui/button.tsx';
import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { paths } from '#src/config/paths.ts';

export default function NotFoundPage() {
  return (
    <AuthLayout title="This page does not exist" description="The link may be old or mistyped.">
      <ButtonLink to={paths.home.getHref()} variant="primary">
        Go to the start page
      </ButtonLink>
    </AuthLayout>
  );
}
