import { useNavigate, useSearchParams } from 'react-router-dom';
import { toast } from 'sonner';
import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { paths } from '#src/config/paths.ts';
import { PasswordResetConfirmForm } from '#src/features/auth/components/password-reset-confirm-form.tsx';

export default function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  return (
    <AuthLayout title="Choose a new password">
      <PasswordResetConfirmForm
        token={searchParams.get('token')}
        onDone={() => {
          toast.success('Password changed. Sign in with the new one.');
          void navigate(paths.signIn.getHref(), { replace: true });
        }}
      />
    </AuthLayout>
  );
}
