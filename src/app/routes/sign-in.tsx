import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { AuthFrame } from '../shell/auth-frame';
import { safeNextPath } from '../../shell/sign-in-path';

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));

  return (
    <AuthFrame title="Sign in to Ringseat">
      <title>Sign in · Ringseat</title>
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      <p className="mt-5">
        <Link
          to="/forgot-password"
          className="inline-flex min-h-touch items-center font-semibold underline underline-offset-4"
        >
          Forgot your password?
        </Link>
      </p>
      <p className="mt-3 text-sm text-muted">
        New here? Your workshop sends you an invite link to set your password.
      </p>
    </AuthFrame>
  );
}

export { SignInRoute as Component };
