// The small line drawings beside words (kinds, outcomes, remove buttons): one 12-unit box drawn in
// the text colour, so a glyph follows the tone of whatever holds it. Always next to a word or a label:
// hidden from screen readers.
import type { ReactNode } from 'react';

export function StrokeGlyph({
  size = 12,
  strokeWidth = 1.5,
  children,
}: {
  size?: number;
  strokeWidth?: number;
  children: ReactNode;
}) {
  return (
    <svg
      viewBox="0 0 12 12"
      width={size}
      height={size}
      aria-hidden="true"
      className="shrink-0"
      fill="none"
      stroke="currentColor"
      strokeWidth={strokeWidth}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      {children}
    </svg>
  );
}

/** The × of remove and close buttons. */
export function CrossGlyph({ size = 10 }: { size?: number }) {
  return (
    <StrokeGlyph size={size}>
      <path d="M2.5 2.5l7 7M9.5 2.5l-7 7" />
    </StrokeGlyph>
  );
}
