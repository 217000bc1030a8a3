// Types of the general-purpose npm libraries the tests cross-check against (they ship none).
declare module 'wilson-score' {
  /** lower bound of the Wilson interval; z defaults to a one-sided 99 % value (2.326348) */
  export default function wilson(up: number, total: number, z?: number): number;
}

declare module 'jstat' {
  /** the CommonJS export is the jStat object itself */
  const jStat: { normal: { inv(p: number, mean: number, sd: number): number } };
  export default jStat;
}
