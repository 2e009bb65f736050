import { Link, useSearchParams } from 'react-router-dom';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { AuthFrame } from '../shell/auth-frame';

/** /forgot-password: a reset link by e-mail, for anyone who cannot sign in. */
export function ForgotPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <AuthFrame title="Forgot your password?">
      <title>Forgot your password · Ringseat</title>
      <p className="mb-4">
        Enter the e-mail address you sign in with. We send a link to choose a new password.
      </p>
      <ForgotPasswordForm email={params.get('email') ?? ''} />
      <p className="mt-5 text-sm">
        <Link
          to="/sign-in"
          className="inline-flex min-h-touch items-center font-semibold underline underline-offset-4"
        >
          Back to sign in
        </Link>
      </p>
    </AuthFrame>
  );
}

export { ForgotPasswordRoute as Component };
