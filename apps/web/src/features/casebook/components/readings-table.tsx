// A case's meter readings beside the known-good board's, with how far each one is off: the lines a
// reader compares with their own board first.
import type { CaseReading } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import {
  formatDifference,
  formatReading,
  isMarkedDifference,
  readingDifference,
  readingModeShort,
  readingUnit,
} from '../reading-format';

function differenceWords(fraction: number | null): string | undefined {
  if (fraction === null) return undefined;
  if (fraction === 0) return 'same as the known-good board';
  return `${formatDifference(Math.abs(fraction)).replace('+', '')} ${fraction < 0 ? 'lower' : 'higher'} than the known-good board`;
}

export function ReadingsTable({
  slug,
  readings,
}: {
  slug: string;
  readings: readonly CaseReading[];
}) {
  const th = 'h-8 px-2.5 text-left text-xs font-medium text-ink-muted';
  const td = 'h-8 px-2.5 align-middle';
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[34rem] border-collapse text-[13px]">
        <caption className="sr-only">Readings against a known-good board</caption>
        <thead className="bg-raised shadow-[0_1px_0_var(--ry-line)]">
          <tr>
            <th scope="col" className={th}>
              Net
            </th>
            <th scope="col" className={th}>
              Mode
            </th>
            <th scope="col" className={`${th} text-right`}>
              Measured
            </th>
            <th scope="col" className={`${th} text-right`}>
              Known-good
            </th>
            <th scope="col" className={`${th} text-right`}>
              Difference
            </th>
          </tr>
        </thead>
        <tbody>
          {readings.map((reading) => {
            const difference = readingDifference(reading.measured, reading.knownGood);
            const marked = isMarkedDifference(difference);
            return (
              <tr
                key={reading.position}
                className={`border-b border-line/70 last:border-b-0 ${marked ? 'bg-caution-soft/60' : ''}`}
              >
                <td className={`${td} font-mono`}>
                  <Link
                    to={paths.net.getHref(slug, reading.net)}
                    className="text-ink hover:text-accent hover:underline"
                  >
                    {reading.net}
                  </Link>
                </td>
                <td className={`${td} text-ink-muted`}>
                  {readingModeShort[reading.mode]}{' '}
                  <span className="text-ink-faint">({readingUnit[reading.mode]})</span>
                </td>
                <td className={`${td} text-right font-mono font-medium tabular`}>
                  {formatReading(reading.mode, reading.measured)}
                </td>
                <td className={`${td} text-right font-mono text-ink-muted tabular`}>
                  {reading.knownGood === null ? (
                    <span className="text-ink-faint" title="No known-good value recorded">
                      —
                    </span>
                  ) : (
                    formatReading(reading.mode, reading.knownGood)
                  )}
                </td>
                <td
                  className={`${td} text-right font-mono tabular ${marked ? 'font-medium text-caution' : 'text-ink-muted'}`}
                  title={
                    reading.knownGood === 0
                      ? 'The known-good board reads zero: compare the values themselves'
                      : differenceWords(difference)
                  }
                >
                  {difference === null ? (
                    <span className="text-ink-faint">—</span>
                  ) : (
                    <>
                      <span aria-hidden="true">{formatDifference(difference)}</span>
                      <span className="sr-only">{differenceWords(difference)}</span>
                    </>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
