import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { PasswordResetRequestForm } from '#src/features/auth/components/password-reset-request-form.tsx';

export default function ForgotPasswordPage() {
  return (
    <AuthLayout title="Choose a new password" description="Give the e-mail address you sign in with, and we will send it a link.">
      <PasswordResetRequestForm />
      <p className="mt-6 text-body">
        <TextLink to={paths.signIn.getHref()} className="inline-flex min-h-12 items-center lg:min-h-0">
          Back to sign in
        </TextLink>
      </p>
    </AuthLayout>
  );
}
