import type { BoardSummary } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { LinkButton } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { formatCount, formatVolts } from '../../../lib/quantity-format';
import { useBoards } from '../api/get-boards';

function Identity({ board }: { board: BoardSummary }) {
  const parts = [board.deviceFamily, board.boardNumber, board.revision && `rev ${board.revision}`];
  const text = parts.filter(Boolean).join(' · ');
  return <span className="text-ink-muted">{text || 'No device family or board number'}</span>;
}

function EmptyBoards({ canImport }: { canImport: boolean }) {
  return (
    <div className="rounded-lg border border-dashed border-line-strong bg-surface px-6 py-10 text-center">
      <h2 className="text-base font-semibold">No boards yet</h2>
      <p className="mx-auto mt-1.5 max-w-md text-sm text-ink-muted">
        A board appears here once its netlist is imported: an IPC-D-356 file, a pin-list CSV or a
        Railyard board JSON, with an optional parts list and annotations.
      </p>
      {canImport ? (
        <LinkButton variant="primary" className="mt-4" to={paths.newBoardImport.getHref()}>
          Import a netlist
        </LinkButton>
      ) : (
        <p className="mt-3 text-[13px] text-ink-faint">Importing boards needs the admin role.</p>
      )}
    </div>
  );
}

const headClass = 'px-3 py-2 text-left text-xs font-medium text-ink-muted';
const numHeadClass = `${headClass} text-right`;
const cellClass = 'px-3 py-2 align-baseline';
const numCellClass = `${cellClass} text-right font-mono tabular text-[13px]`;

/** `canImport`: whether the viewer may import (admins), so the empty list offers it. */
export function BoardList({ canImport }: { canImport: boolean }) {
  const { data } = useBoards();
  const boards = data.boards;
  if (boards.length === 0) return <EmptyBoards canImport={canImport} />;

  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full border-collapse text-sm">
        <thead className="border-b border-line bg-raised/60">
          <tr>
            <th scope="col" className={headClass}>
              Board
            </th>
            <th scope="col" className={numHeadClass}>
              Nets
            </th>
            <th scope="col" className={numHeadClass}>
              Components
            </th>
            <th scope="col" className={numHeadClass}>
              Pins
            </th>
            <th scope="col" className={headClass}>
              Root net
            </th>
            <th scope="col" className={numHeadClass}>
              Battery
            </th>
          </tr>
        </thead>
        <tbody>
          {boards.map((board) => (
            <tr key={board.slug} className="border-b border-line last:border-b-0 hover:bg-select">
              <td className={cellClass}>
                <Link
                  to={paths.board.getHref(board.slug)}
                  className="font-semibold text-ink hover:text-accent hover:underline"
                >
                  {board.title}
                </Link>
                <div className="mt-0.5 text-[13px]">
                  <Identity board={board} />
                  <span className="ml-2 font-mono text-xs text-ink-faint">{board.slug}</span>
                </div>
              </td>
              <td className={numCellClass}>{formatCount(board.netCount)}</td>
              <td className={numCellClass}>{formatCount(board.componentCount)}</td>
              <td className={numCellClass}>{formatCount(board.pinCount)}</td>
              <td className={`${cellClass} font-mono text-[13px]`}>
                {board.rootNet ?? <span className="text-ink-faint">not set</span>}
              </td>
              <td className={numCellClass}>
                {board.batteryVoltage === null ? (
                  <span className="text-ink-faint">—</span>
                ) : (
                  formatVolts(board.batteryVoltage)
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
