import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { readShow } from '../../../shared/review/board-filter';
import type { BoardShow } from '../../../shared/review/review.schema';
import { useBoard } from '../../features/board/api';
import { BOARD_PAGE, RunsBoard } from '../../features/board/components/runs-board';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSettled } from '../../lib/use-settled';
import { StaffOnly } from './staff-only';

function RunsPage() {
  const [params, setParams] = useSearchParams();
  const [q, setQ] = useState('');
  const [limit, setLimit] = useState(BOARD_PAGE);
  const show = readShow(params.get('show'));
  const board = useBoard({ show, q: useSettled(q), limit });
  const setShow = (value: BoardShow) => {
    setLimit(BOARD_PAGE);
    setParams(
      (p) => {
        if (value === 'action') p.delete('show');
        else p.set('show', value);
        return p;
      },
      { replace: true },
    );
  };
  return (
    <div className="flex flex-col gap-5">
      <title>Runs · Ringseat</title>
      <div>
        <h1 className="text-3xl font-bold">Runs</h1>
        <p className="text-muted">
          Every break-in run of the workshop. Runs waiting for your review come first, then runs
          with a broken rule or a device clock off, then engines due for their first service.
        </p>
      </div>
      {board.isPending && <Loading label="Loading the runs…" />}
      {board.isError && (
        <LoadError error={board.error} what="the runs" onRetry={() => board.refetch()} />
      )}
      {board.data && (
        <RunsBoard
          board={board.data}
          show={show}
          q={q}
          onShow={setShow}
          onSearch={(text) => {
            setLimit(BOARD_PAGE);
            setQ(text);
          }}
          onMore={() => setLimit((n) => n + BOARD_PAGE)}
        />
      )}
    </div>
  );
}

export function RunsRoute() {
  return (
    <StaffOnly title="Runs">
      <RunsPage />
    </StaffOnly>
  );
}

export { RunsRoute as Component };
