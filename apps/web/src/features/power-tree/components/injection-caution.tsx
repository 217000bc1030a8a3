// The net page leads to a hands-on step: feeding current into a shorted rail to find the part
// that warms up. Common practice, stated where the technician is about to do it.
import { formatVolts } from '../../../lib/quantity-format';
import { InjectionPlanner } from './injection-planner';

export function InjectionCaution({ nominalVoltage }: { nominalVoltage: number | null }) {
  const ceiling =
    nominalVoltage === null || nominalVoltage === 0
      ? 'never above the rail’s nominal voltage'
      : nominalVoltage > 0
        ? `never above this rail’s ${formatVolts(nominalVoltage)}`
        : `never beyond this rail’s ${formatVolts(nominalVoltage)}`;
  return (
    <aside
      aria-label="Before injecting current"
      className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2.5 text-[13px] leading-snug"
    >
      <p className="font-semibold text-caution">Before injecting current into a short</p>
      <p className="mt-1">
        Disconnect the battery first. Start at a low voltage, about 1 V and {ceiling}, with a modest
        current limit, and raise it slowly. Observe polarity. Hot parts burn. Follow the
        manufacturer’s service documentation for this board.
      </p>
      <p className="mt-1.5 text-ink-muted">
        A MOSFET or load switch in front of a shorted line may heat first without being the faulty
        part: the fault is further down the line.
      </p>
      <InjectionPlanner railVolts={nominalVoltage} />
    </aside>
  );
}
