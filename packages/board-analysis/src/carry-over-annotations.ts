// When a board's netlist is replaced, what people entered (voltages, descriptions, aliases, power links,
// the chosen root) is carried over onto the new netlist wherever its nets still exist. The rest is
// reported as dropped, so nothing disappears silently.
import type { NetKind, PowerLinkKind } from '@railyard/shared';
import type { BoardDraft, DraftPowerLink } from './board-draft';

export interface PreviousNetAnnotation {
  name: string;
  nominalVoltage: number | null;
  description: string;
  aliases: string[];
}

export interface PreviousPowerLink {
  from: string;
  to: string;
  via: string;
  kind: PowerLinkKind;
  enteredBy: string | null;
}

export interface PreviousAnnotations {
  nets: PreviousNetAnnotation[];
  enteredLinks: PreviousPowerLink[];
  /** the root a person chose, if any */
  enteredRoot: string | null;
}

export interface CarriedOver {
  draft: BoardDraft;
  /** links carried over, with who entered them */
  enteredBy: Map<DraftPowerLink, string | null>;
  kept: string[];
  dropped: string[];
}

/**
 * Lays previous annotations over a new draft. Values the new files give win; previous values fill gaps.
 * `rootFromFile` says whether the new files named a root themselves.
 */
export function carryOverAnnotations(
  draft: BoardDraft,
  previous: PreviousAnnotations,
  rootFromFile: boolean,
): CarriedOver {
  const nets = draft.nets.map((n) => ({ ...n, aliases: [...n.aliases] }));
  const byName = new Map(nets.map((n) => [n.name, n]));
  const taken = new Set<string>(nets.flatMap((n) => [n.name, ...n.aliases]));
  const kept: string[] = [];
  const dropped: string[] = [];

  for (const old of previous.nets) {
    const hasAnnotation = old.nominalVoltage !== null || old.description !== '' || old.aliases.length > 0;
    if (!hasAnnotation) continue;
    const net = byName.get(old.name);
    if (!net) {
      dropped.push(`annotations of net ${old.name}: the net is not in the new netlist`);
      continue;
    }
    if (net.nominalVoltage === null && old.nominalVoltage !== null) {
      net.nominalVoltage = old.nominalVoltage;
      // a rail with a nominal voltage is a power rail
      if (net.kind === 'signal') net.kind = 'power' satisfies NetKind;
      kept.push(`nominal voltage of ${old.name}`);
    }
    if (net.description === '' && old.description !== '') {
      net.description = old.description;
      kept.push(`description of ${old.name}`);
    }
    for (const alias of old.aliases) {
      if (net.aliases.includes(alias)) continue;
      if (taken.has(alias)) {
        dropped.push(`alias ${alias} of ${old.name}: the name is used by another net in the new netlist`);
        continue;
      }
      net.aliases.push(alias);
      taken.add(alias);
      kept.push(`alias ${alias} of ${old.name}`);
    }
  }

  const links = [...draft.powerLinks];
  const enteredBy = new Map<DraftPowerLink, string | null>();
  const linkKey = (l: { from: string; to: string; via: string }) => `${l.from}\u0000${l.to}\u0000${l.via}`;
  const present = new Set(links.map(linkKey));
  const refdes = new Set(draft.components.map((c) => c.refdes));
  const warnings = [...draft.warnings];
  for (const old of previous.enteredLinks) {
    const label = `${old.kind} link ${old.from} → ${old.to} via ${old.via}`;
    const missing = [old.from, old.to].filter((n) => !byName.has(n));
    if (missing.length > 0) {
      dropped.push(`${label}: net ${missing.join(' and ')} is not in the new netlist`);
      continue;
    }
    if (present.has(linkKey(old))) continue;
    const link: DraftPowerLink = { from: old.from, to: old.to, via: old.via, kind: old.kind, origin: 'entered' };
    links.push(link);
    enteredBy.set(link, old.enteredBy);
    present.add(linkKey(old));
    kept.push(label);
    if (!refdes.has(old.via)) {
      warnings.push({ line: null, field: null, message: `${label} was kept, but ${old.via} is not in the new netlist` });
    }
  }

  let rootNet = draft.rootNet;
  if (previous.enteredRoot !== null && !rootFromFile) {
    if (byName.has(previous.enteredRoot)) {
      rootNet = previous.enteredRoot;
      kept.push(`root net ${previous.enteredRoot}`);
    } else {
      dropped.push(`root net ${previous.enteredRoot}: the net is not in the new netlist`);
    }
  }

  return { draft: { ...draft, nets, powerLinks: links, rootNet, warnings }, enteredBy, kept, dropped };
}
