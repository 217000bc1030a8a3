type ProgressBarProps = {
  label: string;
  /** 0..1; null while the amount is not known yet. */
  value: number | null;
  tone?: 'accent' | 'ok' | 'danger';
};

const fills = { accent: 'bg-accent', ok: 'bg-ok', danger: 'bg-danger' } as const;

export function ProgressBar({ label, value, tone = 'accent' }: ProgressBarProps) {
  const percent = value === null ? null : Math.round(Math.min(1, Math.max(0, value)) * 100);
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={percent ?? undefined}
      className="relative h-2 w-full overflow-hidden rounded-full bg-sunken ring-1 ring-line ring-inset"
    >
      {percent === null ? (
        <div
          className={`animate-sweep absolute inset-y-0 w-2/5 rounded-full ${fills[tone]} opacity-70`}
        />
      ) : (
        <div
          className={`h-full rounded-full ${fills[tone]} transition-[width] duration-200 ease-out`}
          style={{ width: `${percent}%` }}
        />
      )}
    </div>
  );
}
