import { useState } from 'react';
import { BAND_WORDS, type ReadingRow } from '../../../../shared/review/readings';
import { Button, buttonClass } from '../../../components/ui/button';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { Table, Td, Th } from '../../../components/ui/table';
import { readingsCsvUrl, useReadings } from '../api';
import { formatMoment } from '../format';
import { VoidReading } from './void-reading';

const PAGE = 50;
const BAND_MARK = { 'in-band': '■', over: '▲', under: '▽' } as const;

function ReadingTableRow({
  reading: r,
  voidable,
}: {
  reading: ReadingRow;
  voidable: string | null;
}) {
  // A voided reading stays in the record, struck through; it counts for nothing.
  return (
    <tr className={r.voided ? 'text-muted line-through' : undefined}>
      <Td className="figures whitespace-nowrap">{formatMoment(r.at)}</Td>
      <Td>{r.phaseName}</Td>
      <Td className="figures">
        {r.rpm}
        {r.rpmSource === 'frequency' && r.frequencyHz !== null ? ` (${r.frequencyHz} Hz)` : ''}
      </Td>
      <Td>{r.throttle}</Td>
      <Td className="whitespace-nowrap">
        {r.band ? (
          <>
            <span aria-hidden="true">{BAND_MARK[r.band]} </span>
            {BAND_WORDS[r.band]}
          </>
        ) : (
          '—'
        )}
      </Td>
      <Td className="figures">{r.speedKn !== null ? `${r.speedKn} kn` : '—'}</Td>
      <Td className="figures">{r.hourMeter !== null ? `${r.hourMeter.toFixed(1)} h` : '—'}</Td>
      <Td>
        {r.note ?? ''}
        {r.voided && (
          <span className="block no-underline [text-decoration:none]">
            Voided by {r.voided.byName}: {r.voided.reason}
          </span>
        )}
      </Td>
      {voidable !== null && (
        <Td>{!r.voided && <VoidReading runId={voidable} readingId={r.id} />}</Td>
      )}
    </tr>
  );
}

function ReadingsPager({
  offset,
  last,
  total,
  onGo,
}: {
  offset: number;
  last: number;
  total: number;
  onGo: (offset: number) => void;
}) {
  return (
    <nav aria-label="Readings pages" className="flex flex-wrap items-center gap-3">
      <Button
        variant="secondary"
        disabled={offset === 0}
        onClick={() => onGo(Math.max(0, offset - PAGE))}
      >
        Earlier
      </Button>
      <span className="figures">
        {offset + 1}–{last} of {total}
      </span>
      <Button variant="secondary" disabled={last >= total} onClick={() => onGo(offset + PAGE)}>
        Later
      </Button>
    </nav>
  );
}

/** Every reading, fifty at a time, with the whole list as a CSV download. */
export function ReadingsTable({
  runId,
  total,
  canVoid,
}: {
  runId: string;
  total: number;
  /** Staff, before sign-off: each reading can be voided with a reason. */
  canVoid: boolean;
}) {
  const [offset, setOffset] = useState(0);
  const readings = useReadings(runId, offset, PAGE);
  const last = Math.min(offset + PAGE, readings.data?.total ?? total);
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <a href={readingsCsvUrl(runId)} download className={buttonClass('secondary')}>
          Download all readings (CSV)
        </a>
        <p className="text-muted">{total} readings, oldest first. Times are the device&rsquo;s.</p>
      </div>
      {readings.isPending && <Loading label="Loading readings…" />}
      {readings.isError && (
        <LoadError error={readings.error} what="the readings" onRetry={() => readings.refetch()} />
      )}
      {readings.data && readings.data.readings.length > 0 && (
        <Table>
          <caption className="sr-only">
            Readings {offset + 1} to {last} of {readings.data.total}
          </caption>
          <thead>
            <tr>
              <Th>Time</Th>
              <Th>Phase</Th>
              <Th>RPM</Th>
              <Th>Throttle</Th>
              <Th>Band</Th>
              <Th>Speed</Th>
              <Th>Hour meter</Th>
              <Th>Note</Th>
              {canVoid && <Th>Void</Th>}
            </tr>
          </thead>
          <tbody>
            {readings.data.readings.map((r) => (
              <ReadingTableRow key={r.id} reading={r} voidable={canVoid ? runId : null} />
            ))}
          </tbody>
        </Table>
      )}
      {readings.data && readings.data.total > PAGE && (
        <ReadingsPager offset={offset} last={last} total={readings.data.total} onGo={setOffset} />
      )}
    </div>
  );
}
