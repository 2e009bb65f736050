import type { BoardShow } from '../../../../shared/review/review.schema';
import type { BoardView } from '../../../../shared/review/views';
import { Button } from '../../../components/ui/button';
import { BoardFilters } from './board-filters';
import { BoardCards, BoardTable } from './board-list';

export const BOARD_PAGE = 100;

interface RunsBoardProps {
  board: BoardView;
  show: BoardShow;
  q: string;
  onShow: (show: BoardShow) => void;
  onSearch: (q: string) => void;
  onMore: () => void;
}

function statusText(board: BoardView, show: BoardShow): string {
  if (board.matching === 0)
    return show === 'action'
      ? 'Nothing needs the workshop right now. Choose All to see every run.'
      : 'No runs to show here.';
  return `Showing ${board.runs.length} of ${board.matching} runs${show === 'action' ? ' that need action' : ''}.`;
}

/** The workshop's runs with their filters; long lists grow a hundred rows at a time. */
export function RunsBoard({ board, show, q, onShow, onSearch, onMore }: RunsBoardProps) {
  return (
    <div className="flex flex-col gap-4">
      <BoardFilters
        show={show}
        counts={board.counts}
        actionCount={board.actionCount}
        total={board.total}
        q={q}
        onShow={onShow}
        onSearch={onSearch}
      />
      <p role="status" className="text-muted">
        {statusText(board, show)}
      </p>
      {board.runs.length > 0 && (
        <>
          <div className="hidden sm:block">
            <BoardTable runs={board.runs} />
          </div>
          <div className="sm:hidden">
            <BoardCards runs={board.runs} />
          </div>
        </>
      )}
      {board.matching > board.runs.length && (
        <Button variant="secondary" className="self-start" onClick={onMore}>
          Show {Math.min(BOARD_PAGE, board.matching - board.runs.length)} more
        </Button>
      )}
    </div>
  );
}
