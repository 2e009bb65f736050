import type { ReactNode } from 'react';
import { Button } from '../../../components/ui/button';

/** A form's submit button, and Cancel when the form was opened from a page that can close it. */
export function FormActions({
  pending,
  pendingLabel,
  onCancel,
  children,
}: {
  pending: boolean;
  pendingLabel: string;
  onCancel?: () => void;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-wrap gap-3">
      <Button type="submit" pending={pending} pendingLabel={pendingLabel}>
        {children}
      </Button>
      {onCancel && (
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      )}
    </div>
  );
}
