// A word in a small bordered box, toned by what it says (a net kind, an outcome); the word and its
// glyph carry the meaning, the tone only repeats it.
import type { ReactNode } from 'react';

export function Badge({
  tone,
  title,
  children,
}: {
  /** the text, background and border classes */
  tone: string;
  title?: string;
  children: ReactNode;
}) {
  return (
    <span
      title={title}
      className={`inline-flex h-5 shrink-0 items-center gap-1 rounded border px-1.5 text-[11.5px] leading-none font-medium whitespace-nowrap ${tone}`}
    >
      {children}
    </span>
  );
}
