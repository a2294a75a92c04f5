import { Navigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths, safeNextPath } from '#src/config/paths.ts';
import { SignUpForm } from '#src/features/auth/components/sign-up-form.tsx';
import { useIsSigningOut } from '#src/features/auth/api/use-sign-out.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';

export default function SignUpPage() {
  const user = useCurrentUser();
  const signingOut = useIsSigningOut();
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));
  if (user && !signingOut) return <Navigate replace to={next} />;

  return (
    <AuthLayout
      title="Create your account"
      description="Then create a workshop for your shop, class or club, or open the invitation link a workshop sent you."
    >
      <SignUpForm />
      <p className="mt-6 text-body">
        Already have an account?{' '}
        <TextLink to={paths.signIn.getHref(next)} className="inline-flex min-h-12 items-center lg:min-h-0">
          Sign in
        </TextLink>
      </p>
    </AuthLayout>
  );
}
