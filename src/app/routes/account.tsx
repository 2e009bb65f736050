import { useNavigate } from 'react-router-dom';
import { useAccount } from '../../features/auth/account-api';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form';
import { SignOutEverywhere } from '../../features/auth/components/sign-out-everywhere';
import { formatDate } from '../../lib/format';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSessionUser } from '../shell/session';

const roleWord = { skipper: 'Skipper', technician: 'Technician', manager: 'Manager' } as const;

/** /account: the signed-in person's own password and sessions, for every role. */
export function AccountRoute() {
  const user = useSessionUser();
  const account = useAccount();
  const navigate = useNavigate();
  return (
    <div className="flex flex-col gap-6">
      <title>Your account · Ringseat</title>
      <div>
        <h1 className="text-3xl font-bold">Your account</h1>
        <p className="break-words">
          {user.name} · {roleWord[user.role]} at {user.workshopName} · {user.email}
        </p>
        <p className="text-sm text-muted">
          Your workshop&rsquo;s manager changes your name, role or e-mail address.
        </p>
      </div>
      {account.isPending && <Loading label="Loading your account…" />}
      {account.isError && (
        <LoadError error={account.error} what="your account" onRetry={() => account.refetch()} />
      )}
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="Change your password" className="self-start">
          {account.data && (
            <p className="mb-3 text-sm text-muted">
              {account.data.passwordChangedAt
                ? `Last changed on ${formatDate(account.data.passwordChangedAt)}.`
                : 'Still the password you chose when you joined.'}
            </p>
          )}
          <ChangePasswordForm />
        </Card>
        <Card title="Devices signed in" className="self-start">
          {account.data && (
            <SignOutEverywhere
              sessions={account.data.sessions}
              onDone={() => navigate('/sign-in', { replace: true })}
            />
          )}
        </Card>
      </div>
    </div>
  );
}

export { AccountRoute as Component };
