import { useNavigate, useParams } from 'react-router-dom';
import { useResetPreview } from '../../features/auth/account-api';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';
import { errorMessage, isApiError } from '../../lib/api-client';
import { Alert } from '../../components/ui/alert';
import { ButtonLink } from '../../components/ui/button-link';
import { Loading } from '../../components/ui/status-message';
import { AuthFrame } from '../shell/auth-frame';

function deadLinkMessage(error: unknown): string {
  if (isApiError(error) && error.status === 404)
    return 'This reset link is not valid. Check that the whole link was copied, or ask for a new one.';
  return errorMessage(error);
}

/** /reset-password/:token: the page a reset e-mail links to. */
export function ResetPasswordRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useResetPreview(token);
  return (
    <AuthFrame title="Choose a new password">
      <title>New password · Ringseat</title>
      {preview.isPending && <Loading label="Checking the link…" />}
      {preview.isError && (
        <div className="flex flex-col gap-4">
          <Alert title="This link does not work">{deadLinkMessage(preview.error)}</Alert>
          <ButtonLink to="/forgot-password" variant="secondary">
            Ask for a new link
          </ButtonLink>
        </div>
      )}
      {preview.data && (
        <div className="flex flex-col gap-5">
          <p>
            For <strong className="break-all">{preview.data.email}</strong>. Every device signed in
            to this account is signed out when you save.
          </p>
          <ResetPasswordForm
            token={token}
            email={preview.data.email}
            onDone={() => navigate('/', { replace: true })}
          />
        </div>
      )}
    </AuthFrame>
  );
}

export { ResetPasswordRoute as Component };
