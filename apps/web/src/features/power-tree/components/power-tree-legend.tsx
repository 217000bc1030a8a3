import type { PowerLinkKind } from '@railyard/shared';
import type { ReactNode } from 'react';
import { linkKindHint, linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

function Swatch({ children }: { children: ReactNode }) {
  return (
    <svg viewBox="0 0 26 14" width={26} height={14} aria-hidden="true" className="shrink-0">
      {children}
    </svg>
  );
}

function Item({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <li className="inline-flex items-center gap-1.5">
      {swatch}
      <span>{children}</span>
    </li>
  );
}

/** What the shapes, lines and lights of the graph mean; the same drawing as the canvas. */
export function PowerTreeLegend({ cutOff = false }: { cutOff?: boolean }) {
  const tint = { fillOpacity: 0.16 };
  return (
    <div className="flex flex-wrap gap-x-6 gap-y-1.5 text-xs text-ink-muted">
      <ul aria-label="Net kinds" className="flex flex-wrap items-center gap-x-3.5 gap-y-1">
        <Item
          swatch={
            <Swatch>
              <rect
                x="1"
                y="2"
                width="24"
                height="10"
                rx="3.5"
                fill="var(--ry-power)"
                style={tint}
                stroke="var(--ry-power)"
                strokeWidth="1.3"
              />
            </Swatch>
          }
        >
          power
        </Item>
        <Item
          swatch={
            <Swatch>
              <path
                d="M4 2h18q3 5 0 10H4q-3-5 0-10Z"
                fill="var(--ry-ground)"
                style={tint}
                stroke="var(--ry-ground)"
                strokeWidth="1.3"
              />
            </Swatch>
          }
        >
          ground
        </Item>
        <Item
          swatch={
            <Swatch>
              <rect
                x="1"
                y="2"
                width="24"
                height="10"
                fill="var(--ry-signal)"
                style={{ fillOpacity: 0.1 }}
                stroke="var(--ry-signal)"
                strokeWidth="1.3"
                strokeDasharray="3 2"
              />
            </Swatch>
          }
        >
          signal
        </Item>
        <Item
          swatch={
            <Swatch>
              <rect
                x="1.5"
                y="1.5"
                width="23"
                height="11"
                rx="3.5"
                fill="none"
                stroke="var(--ry-ink-muted)"
                strokeWidth="1"
              />
              <rect
                x="3.5"
                y="3.5"
                width="19"
                height="7"
                rx="2"
                fill="none"
                stroke="var(--ry-ink-muted)"
                strokeWidth="1"
              />
            </Swatch>
          }
        >
          start of the drawing
        </Item>
      </ul>
      <ul aria-label="Link kinds" className="flex flex-wrap items-center gap-x-3.5 gap-y-1">
        {(Object.keys(linkKindLabel) as PowerLinkKind[]).map((kind) => (
          <Item key={kind} swatch={<PowerLinkGlyph kind={kind} />}>
            <span title={linkKindHint[kind]}>{linkKindLabel[kind]}</span>
          </Item>
        ))}
      </ul>
      <ul aria-label="Highlights" className="flex flex-wrap items-center gap-x-3.5 gap-y-1">
        <Item
          swatch={
            <Swatch>
              <rect
                x="0.5"
                y="0.5"
                width="25"
                height="13"
                rx="5"
                fill="var(--ry-lamp)"
                style={{ fillOpacity: 0.22 }}
              />
              <rect
                x="3"
                y="3"
                width="20"
                height="8"
                rx="3"
                fill="none"
                stroke="var(--ry-lamp)"
                strokeWidth="2"
              />
            </Swatch>
          }
        >
          this rail
        </Item>
        <Item
          swatch={
            <Swatch>
              <path d="M1 7H25" stroke="var(--ry-lamp)" strokeWidth="3" />
            </Swatch>
          }
        >
          way from the root
        </Item>
        <Item
          swatch={
            <Swatch>
              <rect
                x="2.5"
                y="2.5"
                width="21"
                height="9"
                rx="3"
                fill="none"
                stroke="var(--ry-lamp)"
                strokeWidth="1.5"
                strokeDasharray="1.5 2"
              />
            </Swatch>
          }
        >
          same coupled group
        </Item>
        <Item
          swatch={
            <span className="inline-flex h-4 items-center rounded-full bg-accent px-1.5 text-[10.5px] font-semibold text-accent-ink">
              +4
            </span>
          }
        >
          hidden below
        </Item>
        {cutOff && (
          <Item
            swatch={
              <span className="inline-flex h-4 items-center rounded-full bg-caution px-1.5 text-[10.5px] font-semibold text-sunken">
                ⋯
              </span>
            }
          >
            cut off by the depth limit: click to trace deeper
          </Item>
        )}
        <Item
          swatch={
            <span className="inline-flex h-4 items-center rounded border border-dotted border-line-strong bg-raised px-1 font-mono text-[10px]">
              12 parts
            </span>
          }
        >
          loads of a rail
        </Item>
      </ul>
    </div>
  );
}
