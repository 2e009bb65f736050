import { useNavigate, useParams } from 'react-router-dom';
import { useInvitePreview } from '../../features/auth/api';
import { AcceptInviteForm } from '../../features/auth/components/accept-invite-form';
import { isApiError } from '../../lib/api-client';
import { formatDate } from '../../lib/format';
import { Alert } from '../../components/ui/alert';
import { ButtonLink } from '../../components/ui/button-link';
import { Loading } from '../../components/ui/status-message';
import { AuthFrame } from '../shell/auth-frame';

const roleLabel = { skipper: 'skipper', technician: 'technician', manager: 'manager' } as const;

function deadLinkMessage(error: unknown): { title: string; detail: string } {
  // The server says which: expired, already used, or withdrawn by the workshop.
  if (isApiError(error) && error.status === 410)
    return { title: 'This invite link no longer works', detail: error.message };
  if (isApiError(error) && error.status === 404) {
    return {
      title: 'This invite link is not valid',
      detail: 'Check that the whole link was copied, or ask your workshop for a new invite.',
    };
  }
  return {
    title: 'Could not check the invite',
    detail: isApiError(error) ? error.message : 'Try again in a moment.',
  };
}

export function AcceptInviteRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useInvitePreview(token);

  return (
    <AuthFrame title="Join your workshop on Ringseat">
      <title>Accept invite · Ringseat</title>
      {preview.isPending && <Loading label="Checking the invite link…" />}
      {preview.isError && (
        <div className="flex flex-col gap-4">
          <Alert title={deadLinkMessage(preview.error).title}>
            {deadLinkMessage(preview.error).detail}
          </Alert>
          <ButtonLink to="/sign-in" variant="secondary">
            Go to sign in
          </ButtonLink>
        </div>
      )}
      {preview.data && (
        <div className="flex flex-col gap-5">
          <p>
            <strong>{preview.data.workshopName}</strong> invites you as a{' '}
            <strong>{roleLabel[preview.data.role]}</strong>. You will sign in with{' '}
            <strong className="break-all">{preview.data.email}</strong>. The invite is valid until{' '}
            {formatDate(preview.data.expiresAt)}.
          </p>
          <AcceptInviteForm token={token} onAccepted={() => navigate('/', { replace: true })} />
        </div>
      )}
    </AuthFrame>
  );
}

export { AcceptInviteRoute as Component };
