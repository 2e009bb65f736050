import type { ReactNode } from 'react';
import { errorMessage } from '../../lib/api-client';
import { Alert } from './alert';
import { Button } from './button';

export function Loading({ label }: { label: string }) {
  return (
    <p role="status" className="py-6 text-muted">
      {label}
    </p>
  );
}

/** Inline error for a failed query, with a retry. */
export function LoadError({
  error,
  what,
  onRetry,
}: {
  error: unknown;
  what: string;
  onRetry?: () => void;
}): ReactNode {
  return (
    <Alert title={`Could not load ${what}`}>
      <p>{errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Alert>
  );
}
