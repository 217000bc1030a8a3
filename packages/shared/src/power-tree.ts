// The power tree contract: net detail, downstream/upstream traces, coupled groups, rail loads, rail search.
import { z } from 'zod';
import {
  boardSlugSchema,
  componentKindSchema,
  netKindSchema,
  netRowSchema,
  powerLinkKindSchema,
  powerLinkOriginSchema,
} from './board';

/** One directed power link: power flows from `from` to `to` through the part `via`. */
export const powerEdgeSchema = z.object({
  from: z.string(),
  to: z.string(),
  via: z.string(),
  /** kind of the via part, null when the netlist no longer has it */
  viaKind: componentKindSchema.nullable(),
  kind: powerLinkKindSchema,
  origin: powerLinkOriginSchema,
});
export type PowerEdge = z.infer<typeof powerEdgeSchema>;

/** How a part on a rail relates to it. */
export const loadRoles = ['shunt', 'draw', 'series', 'other'] as const;
export const loadRoleSchema = z.enum(loadRoles);
export type LoadRole = z.infer<typeof loadRoleSchema>;

export const railPartSchema = z.object({
  refdes: z.string(),
  kind: componentKindSchema,
  value: z.string(),
  magnitude: z.number().nullable(),
  unit: z.string().nullable(),
  package: z.string(),
  side: z.enum(['top', 'bottom']).nullable(),
  role: loadRoleSchema,
  /** pins of this part on the rail */
  pins: z.array(z.string()),
  /** the other nets this part touches */
  otherNets: z.array(z.string()),
});
export type RailPart = z.infer<typeof railPartSchema>;

export const railLoadsSchema = z.object({
  parts: z.array(railPartSchema),
  countsByRole: z.record(loadRoleSchema, z.number().int()),
  countsByKind: z.record(z.string(), z.number().int()),
  capacitance: z.object({
    /** summed capacitance of the rail's capacitors to ground, farads */
    totalFarads: z.number(),
    counted: z.number().int(),
    /** refdes of capacitors whose value could not be parsed: not guessed, not summed */
    unparsed: z.array(z.string()),
  }),
});
export type RailLoads = z.infer<typeof railLoadsSchema>;

export const treeDirections = ['down', 'up'] as const;
export const treeDirectionSchema = z.enum(treeDirections);
export type TreeDirection = z.infer<typeof treeDirectionSchema>;

export const treeNodeSchema = z.object({
  net: z.string(),
  kind: netKindSchema,
  nominalVoltage: z.number().nullable(),
  /** hops from the start net along the traced direction */
  depth: z.number().int(),
  /** distinct parts with a pin on the rail */
  loadCount: z.number().int(),
  countsByRole: z.record(loadRoleSchema, z.number().int()),
  /** links leaving this node in the traced direction (children), including ones cut off by depth */
  childCount: z.number().int(),
  /** true when the depth limit cut off this node's children */
  truncated: z.boolean(),
});
export type TreeNode = z.infer<typeof treeNodeSchema>;

export const powerTreeSchema = z.object({
  board: boardSlugSchema,
  start: z.string(),
  direction: treeDirectionSchema,
  depth: z.number().int(),
  nodes: z.array(treeNodeSchema),
  /** every link between two nodes of the answer; `tree` marks the edge BFS first reached a node by */
  edges: z.array(powerEdgeSchema.extend({ tree: z.boolean() })),
});
export type PowerTree = z.infer<typeof powerTreeSchema>;

export const treeQuerySchema = z.strictObject({
  direction: treeDirectionSchema.default('down'),
  depth: z.coerce.number().int().min(1).max(64).default(32),
});

/** One way from the root down to a rail, as the steps taken. */
export const upstreamPathSchema = z.array(
  z.object({ net: z.string(), via: z.string().nullable(), kind: powerLinkKindSchema.nullable() }),
);
export type UpstreamPath = z.infer<typeof upstreamPathSchema>;

export const coupledGroupSchema = z.object({
  /** nets joined to this one by series links only (inductors, ferrites, fuses, 0-ohm links) */
  nets: z.array(z.object({ name: z.string(), kind: netKindSchema, nominalVoltage: z.number().nullable() })),
  links: z.array(powerEdgeSchema),
});
export type CoupledGroup = z.infer<typeof coupledGroupSchema>;

export const netDetailSchema = z.object({
  board: boardSlugSchema,
  rootNet: z.string().nullable(),
  net: netRowSchema,
  isRoot: z.boolean(),
  coupledGroup: coupledGroupSchema,
  /** shortest ways from the root to this rail (at most a few), root first */
  upstreamPaths: z.array(upstreamPathSchema),
  linksIn: z.array(powerEdgeSchema),
  linksOut: z.array(powerEdgeSchema),
  loads: railLoadsSchema,
});
export type NetDetail = z.infer<typeof netDetailSchema>;

export const railSearchQuerySchema = z.strictObject({
  q: z.string().trim().min(1, 'type part of a rail name').max(100),
  limit: z.coerce.number().int().min(1).max(100).default(20),
  /** only this board's rails */
  board: boardSlugSchema.optional(),
});

export const railSearchResponseSchema = z.object({
  query: z.string(),
  groups: z.array(
    z.object({
      board: z.object({ slug: z.string(), title: z.string() }),
      nets: z.array(
        z.object({
          name: z.string(),
          kind: netKindSchema,
          nominalVoltage: z.number().nullable(),
          /** the alias that matched, when it was not the printed name */
          matchedAlias: z.string().nullable(),
          score: z.number(),
        }),
      ),
    }),
  ),
});
export type RailSearchResponse = z.infer<typeof railSearchResponseSchema>;
