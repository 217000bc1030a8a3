// Assigns nets to the balls of a grid package the way real pin-outs are laid out: signals on the
// outer rings (they have to escape the package), supply and ground balls inside, each supply in its
// own sector so its decoupling sits together, ground filling every gap.
import type { Footprint } from './footprints';

export interface BallMapSpec {
  /** Assigned in order around the package on the outer rings, so buses stay together. */
  signals: readonly string[];
  /** Supply nets and how many balls each gets, inside the signal rings. */
  power: readonly (readonly [net: string, count: number])[];
  /** How many outer rings are reserved for signals. */
  signalRings: number;
  /** 'checker' leaves every other inner ball for ground, as big processors do. */
  groundPattern: 'checker' | 'none';
  /** Balls left unconnected, taken from ground positions on the outermost ring. */
  notConnected?: number;
  ground?: string;
}

interface Ball {
  index: number;
  ring: number;
  angle: number;
  checker: boolean;
}

export function ballMap(footprint: Footprint, spec: BallMapSpec): (string | null)[] {
  const ground = spec.ground ?? 'GND';
  const xs = footprint.pads.map((p) => p.dx);
  const ys = footprint.pads.map((p) => p.dy);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const pitch = smallestStep(xs) || smallestStep(ys) || 1;
  const balls: Ball[] = footprint.pads.map((p, index) => ({
    index,
    ring: Math.round(Math.min(p.dx - minX, maxX - p.dx, p.dy - minY, maxY - p.dy) / pitch),
    angle: Math.atan2(p.dy, p.dx),
    checker: (Math.round((p.dx - minX) / pitch) + Math.round((p.dy - minY) / pitch)) % 2 === 0,
  }));
  const byAngle = (a: Ball, b: Ball) => a.angle - b.angle || a.ring - b.ring || a.index - b.index;
  const nets: (string | null)[] = footprint.pads.map(() => ground);

  const outer = balls.filter((b) => b.ring < spec.signalRings).sort(byAngle);
  if (spec.signals.length > outer.length) {
    throw new RangeError(
      `${footprint.package}: ${spec.signals.length} signals do not fit on ${outer.length} balls of the outer ${spec.signalRings} rings`,
    );
  }
  spreadOver(outer, spec.signals, nets);

  const inner = balls.filter((b) => b.ring >= spec.signalRings);
  const pool = inner.filter((b) => spec.groundPattern === 'none' || !b.checker).sort(byAngle);
  const supplies = spec.power.flatMap(([net, count]) => Array.from({ length: count }, () => net));
  if (supplies.length > pool.length) {
    throw new RangeError(
      `${footprint.package}: ${supplies.length} supply balls do not fit on ${pool.length} inner positions`,
    );
  }
  spreadOver(pool, supplies, nets);

  const spareGround = balls.filter((b) => b.ring === 0 && nets[b.index] === ground);
  const unconnected = spec.notConnected ?? 0;
  if (unconnected > spareGround.length) {
    throw new RangeError(
      `${footprint.package}: only ${spareGround.length} outer ground balls to leave unconnected`,
    );
  }
  for (let i = 0; i < unconnected; i++) {
    const ball = spareGround[Math.floor((i * spareGround.length) / unconnected)] as Ball;
    nets[ball.index] = null;
  }
  return nets;
}

/** Places `items` at evenly spaced positions of `slots`, keeping their order. */
function spreadOver(
  slots: readonly Ball[],
  items: readonly string[],
  nets: (string | null)[],
): void {
  items.forEach((net, i) => {
    const slot = slots[Math.floor((i * slots.length) / items.length)] as Ball;
    nets[slot.index] = net;
  });
}

function smallestStep(values: readonly number[]): number {
  const sorted = [...new Set(values)].sort((a, b) => a - b);
  let step = Infinity;
  for (let i = 1; i < sorted.length; i++)
    step = Math.min(step, (sorted[i] as number) - (sorted[i - 1] as number));
  return Number.isFinite(step) ? step : 0;
}
