import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { vesselQueries } from '../../features/vessels/api';
import { decideWords, enginesToDecide } from '../../features/review/vessel-decisions';

/**
 * When more than one engine of the vessel waits for a decision (a twin submitted together), the
 * way to decide them on one page. Nothing while the vessel loads or when only one waits.
 */
export function DecideTogetherLink({
  vesselId,
  className,
}: {
  vesselId: string;
  className?: string;
}) {
  // A skipper's submit may come while the page is open: look again every half minute.
  const vessel = useQuery({ ...vesselQueries.detail(vesselId), refetchInterval: 30_000 });
  const waiting = vessel.data ? enginesToDecide(vessel.data).length : 0;
  if (waiting < 2) return null;
  return (
    <p className={className}>
      {waiting} engines of {vessel.data!.name} wait for a decision.{' '}
      <Link
        to={`/vessels/${vesselId}/decide`}
        className="inline-flex min-h-touch items-center font-semibold underline underline-offset-4"
      >
        {decideWords(waiting)}
      </Link>
    </p>
  );
}
