import { useEffect, useRef } from 'react';
import type { DecisionView, RunReviewView } from '../../../../shared/review/views';
import { Alert } from '../../../components/ui/alert';
import { buttonClass } from '../../../components/ui/button';
import { formatMoment } from '../format';

/** The signed-off run's certificate: its number and the download. */
export function CertificateCard({
  certificate,
}: {
  certificate: NonNullable<RunReviewView['certificate']>;
}) {
  return (
    <div className="flex flex-col gap-2">
      <p>
        Certificate <strong className="figures">{certificate.number}</strong>, issued{' '}
        {formatMoment(certificate.issuedAt)}.
      </p>
      <a href={certificate.downloadUrl} download className={buttonClass('primary', 'self-start')}>
        Download the certificate (PDF)
      </a>
      <p className="text-sm text-muted">
        The run is signed off and frozen: nothing more can be logged or changed on it.
      </p>
    </div>
  );
}

/** What just happened, said plainly, including whether the skipper was e-mailed. */
export function DecisionNotice({ result }: { result: DecisionView }) {
  // The form that was used is gone once the run is decided: bring the outcome into view and focus.
  const notice = useRef<HTMLDivElement>(null);
  useEffect(() => {
    notice.current?.focus();
    notice.current?.scrollIntoView({ block: 'center' });
  }, []);
  const mail = result.mail.sent
    ? `The skipper was e-mailed (${result.mail.to.join(', ')}).`
    : `The e-mail to the skipper was not sent: ${result.mail.problem}`;
  return (
    <div
      ref={notice}
      tabIndex={-1}
      role="status"
      className="rounded-md border-4 border-ink bg-surface p-3"
    >
      <p className="font-bold">
        {result.state === 'signed-off'
          ? `Signed off. Certificate ${result.certificate?.number} issued.`
          : 'Returned to the skipper.'}
      </p>
      <p>{mail}</p>
    </div>
  );
}

/** Earlier decisions on this run, newest last. */
export function ReviewHistory({ reviews }: { reviews: RunReviewView['reviews'] }) {
  if (reviews.length === 0) return null;
  return (
    <ol className="flex flex-col gap-2" aria-label="Decisions">
      {reviews.map((r, i) => (
        <li key={i} className="rounded-md border-2 border-line p-2">
          <p className="font-semibold">
            {r.decision === 'confirmed' ? 'Confirmed' : 'Returned'} by {r.reviewerName},{' '}
            {formatMoment(r.decidedAt)}
          </p>
          {r.comments && <p>{r.comments}</p>}
          {r.rerunPhaseNames.length > 0 && (
            <p className="text-sm">To run again: {r.rerunPhaseNames.join(', ')}</p>
          )}
        </li>
      ))}
    </ol>
  );
}

/** A device clock far off: times on this page are the device's, so say so before anyone trusts them. */
export function ClockFlag({ skewMs }: { skewMs: number }) {
  const hours = Math.round(Math.abs(skewMs) / 3_600_000);
  return (
    <Alert title="Device clock off">
      The phone that logged this run had its clock about {hours} hours{' '}
      {skewMs > 0 ? 'ahead of' : 'behind'} the server&rsquo;s when it sent its entries. The times
      shown here are the phone&rsquo;s; the running times and the verdict do not depend on the clock
      being right.
    </Alert>
  );
}
