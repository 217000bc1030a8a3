import type { ReactNode } from 'react';

export function Kbd({ children }: { children: ReactNode }) {
  return (
    <kbd className="inline-flex h-4.5 min-w-4.5 items-center justify-center rounded border border-line-strong bg-raised px-1 text-[11px] leading-none text-ink-muted">
      {children}
    </kbd>
  );
}
