import { useState } from 'react';
import type { SkipperOption, VesselView } from '../../../../shared/vessels/vessel-view';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { LoadError } from '../../../components/ui/status-message';
import { errorMessage } from '../../../lib/api-client';
import { useSkipperLink, useSkippers } from '../api';

type SkipperLink = ReturnType<typeof useSkipperLink>;

/** Which skippers may see this vessel and log its break-in. */
export function SkipperLinks({ vessel }: { vessel: VesselView }) {
  const skippers = useSkippers();
  const link = useSkipperLink();
  const linkedIds = new Set(vessel.skippers.map((s) => s.id));
  const choices = (skippers.data ?? []).filter((s) => !linkedIds.has(s.id));
  const readOnly = Boolean(vessel.archivedAt);

  return (
    <div className="flex flex-col gap-3">
      {link.isError && <Alert title="The link was not changed">{errorMessage(link.error)}</Alert>}
      <LinkedSkippers vessel={vessel} link={link} readOnly={readOnly} />
      {skippers.isError && (
        <LoadError error={skippers.error} what="the skippers" onRetry={() => skippers.refetch()} />
      )}
      {!readOnly &&
        skippers.data &&
        (choices.length === 0 ? (
          <p className="text-sm text-muted">
            Every skipper of the workshop is linked. Invite a new skipper from the Team page.
          </p>
        ) : (
          <LinkSkipper vesselId={vessel.id} choices={choices} link={link} />
        ))}
    </div>
  );
}

function LinkedSkippers({
  vessel,
  link,
  readOnly,
}: {
  vessel: VesselView;
  link: SkipperLink;
  readOnly: boolean;
}) {
  if (vessel.skippers.length === 0)
    return (
      <p>No skipper is linked yet: nobody can log this vessel&rsquo;s break-in on the water.</p>
    );
  return (
    <ul className="flex flex-col gap-2" aria-label={`Skippers of ${vessel.name}`}>
      {vessel.skippers.map((s) => (
        <li
          key={s.id}
          className="flex flex-wrap items-center justify-between gap-2 rounded-md border-2 border-line px-3 py-1"
        >
          <span className="font-semibold">{s.name}</span>
          {!readOnly && (
            <Button
              variant="quiet"
              disabled={link.isPending}
              onClick={() => link.mutate({ vesselId: vessel.id, userId: s.id, linked: false })}
            >
              Unlink {s.name}
            </Button>
          )}
        </li>
      ))}
    </ul>
  );
}

/** Choose one of the workshop's other skippers and link them to the vessel. */
function LinkSkipper({
  vesselId,
  choices,
  link,
}: {
  vesselId: string;
  choices: SkipperOption[];
  link: SkipperLink;
}) {
  const [chosen, setChosen] = useState('');
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="min-w-56 flex-1">
        <SelectField
          label="Link a skipper"
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
        >
          <option value="">Choose a skipper…</option>
          {choices.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name} ({s.email})
            </option>
          ))}
        </SelectField>
      </div>
      <Button
        variant="secondary"
        disabled={!chosen}
        pending={link.isPending}
        pendingLabel="Linking…"
        onClick={() =>
          link.mutate(
            { vesselId, userId: chosen, linked: true },
            { onSuccess: () => setChosen('') },
          )
        }
      >
        Link skipper
      </Button>
    </div>
  );
}
