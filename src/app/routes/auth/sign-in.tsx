import { Navigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths, safeNextPath } from '#src/config/paths.ts';
import { SignInForm } from '#src/features/auth/components/sign-in-form.tsx';
import { useIsSigningOut } from '#src/features/auth/api/use-sign-out.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';

export default function SignInPage() {
  const user = useCurrentUser();
  const signingOut = useIsSigningOut();
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));

  // Signed in (already, or just now through the form): go where they were heading.
  if (user && !signingOut) return <Navigate replace to={next} />;

  return (
    <AuthLayout title="Sign in" description="Your heat log, photos and defect reports.">
      <SignInForm />
      <div className="mt-6 flex flex-col gap-3 text-body">
        <TextLink to={paths.forgotPassword.getHref()} className="inline-flex min-h-12 items-center lg:min-h-0">
          Forgot your password?
        </TextLink>
        <p>
          New to Pourscope?{' '}
          <TextLink to={paths.signUp.getHref(next)} className="inline-flex min-h-12 items-center lg:min-h-0">
            Create an account
          </TextLink>
        </p>
      </div>
    </AuthLayout>
  );
}
