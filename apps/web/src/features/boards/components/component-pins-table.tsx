// A part's pins in the order its datasheet lists them, each with the net to probe on the board.
// Ground pins are marked: readings on the other pins are taken against them.
import type { ComponentPin } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { formatCount, formatVolts } from '../../../lib/quantity-format';

export function ComponentPinsTable({
  slug,
  refdes,
  pins,
}: {
  slug: string;
  refdes: string;
  pins: readonly ComponentPin[];
}) {
  const th = 'h-8 px-2 text-left text-xs font-medium text-ink-muted';
  const td = 'h-7 px-2 align-middle';
  const groundPins = pins.filter((pin) => pin.ground).length;
  return (
    <section
      aria-labelledby="component-pins-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex flex-wrap items-baseline gap-x-3 border-b border-line px-3 py-2">
        <h2 id="component-pins-title" className="text-sm font-semibold">
          Pins of <span className="font-mono">{refdes}</span>
        </h2>
        <span className="text-xs text-ink-muted">
          {formatCount(pins.length)} {pins.length === 1 ? 'pin' : 'pins'}
          {groundPins > 0 && `, ${formatCount(groundPins)} on ground`}
        </span>
      </header>
      {pins.length === 0 ? (
        <p className="px-3 py-6 text-center text-sm text-ink-muted">
          The netlist gives this part no pins.
        </p>
      ) : (
        <div className="max-h-[40rem] overflow-auto">
          <table className="w-full table-fixed border-collapse text-[13px]">
            <caption className="sr-only">Pins of {refdes} and their nets</caption>
            <colgroup>
              <col className="w-[5.5rem]" />
              <col />
              <col className="w-[6.5rem]" />
              <col className="w-[6rem]" />
            </colgroup>
            <thead className="sticky top-0 z-10 bg-raised shadow-[0_1px_0_var(--ry-line)]">
              <tr>
                <th scope="col" className={th}>
                  Pin
                </th>
                <th scope="col" className={th}>
                  Net
                </th>
                <th scope="col" className={th}>
                  Kind
                </th>
                <th scope="col" className={`${th} text-right`}>
                  Nominal
                </th>
              </tr>
            </thead>
            <tbody>
              {pins.map((pin) => (
                <tr
                  key={pin.pin}
                  className={`border-b border-line/70 hover:bg-raised/60 ${pin.ground ? 'bg-ground-soft/40' : ''}`}
                >
                  <th
                    scope="row"
                    className={`${td} truncate text-left font-mono font-medium`}
                    title={pin.pin}
                  >
                    {pin.pin}
                  </th>
                  <td className={`${td} truncate font-mono`} title={pin.net ?? undefined}>
                    {pin.net === null ? (
                      <span className="font-sans text-xs text-ink-faint">not connected</span>
                    ) : (
                      <Link
                        to={paths.net.getHref(slug, pin.net)}
                        className="text-ink hover:text-accent hover:underline"
                      >
                        {pin.net}
                      </Link>
                    )}
                  </td>
                  <td className={td}>{pin.netKind && <NetKindBadge kind={pin.netKind} />}</td>
                  <td className={`${td} text-right font-mono text-xs text-ink tabular`}>
                    {formatVolts(pin.nominalVoltage)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
