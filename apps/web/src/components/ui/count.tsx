// A count in running text: the number in the monospaced ink the other figures use, and its noun.
import { formatCount } from '../../lib/quantity-format';

export function Count({ value }: { value: number }) {
  return <span className="font-mono text-ink tabular">{formatCount(value)}</span>;
}

/** "1 pin", "25 pins": the number and the noun that goes with it. */
export function Counted({ value, one, many }: { value: number; one: string; many: string }) {
  return (
    <span>
      <Count value={value} /> {value === 1 ? one : many}
    </span>
  );
}
