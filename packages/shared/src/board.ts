// The board data contract shared by the API and the web client.
import { z } from 'zod';

export const netKinds = ['power', 'ground', 'signal'] as const;
export const netKindSchema = z.enum(netKinds);
export type NetKind = z.infer<typeof netKindSchema>;

export const componentKinds = [
  'capacitor',
  'resistor',
  'inductor',
  'ferrite',
  'fuse',
  'diode',
  'tvs',
  'mosfet',
  'transistor',
  'ic',
  'connector',
  'crystal',
  'testpoint',
  'other',
] as const;
export const componentKindSchema = z.enum(componentKinds);
export type ComponentKind = z.infer<typeof componentKindSchema>;

export const boardSides = ['top', 'bottom'] as const;
export const boardSideSchema = z.enum(boardSides);
export type BoardSide = z.infer<typeof boardSideSchema>;

export const powerLinkKinds = ['converter', 'switch', 'series'] as const;
export const powerLinkKindSchema = z.enum(powerLinkKinds);
export type PowerLinkKind = z.infer<typeof powerLinkKindSchema>;

export const powerLinkOrigins = ['derived', 'entered'] as const;
export const powerLinkOriginSchema = z.enum(powerLinkOrigins);
export type PowerLinkOrigin = z.infer<typeof powerLinkOriginSchema>;

/** Board slugs appear in URLs: lower-case letters, digits and single hyphens. */
export const boardSlugSchema = z
  .string()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'use lower-case letters, digits and single hyphens')
  .min(2)
  .max(64);

export const boardMetaSchema = z.strictObject({
  title: z.string().trim().min(1).max(200),
  deviceFamily: z.string().trim().max(120).default(''),
  boardNumber: z.string().trim().max(120).default(''),
  revision: z.string().trim().max(40).default(''),
  batteryVoltage: z.number().positive().max(100).nullable().default(null),
  notes: z.string().max(10_000).default(''),
});
export type BoardMeta = z.infer<typeof boardMetaSchema>;

export const boardSummarySchema = z.object({
  slug: boardSlugSchema,
  title: z.string(),
  deviceFamily: z.string(),
  boardNumber: z.string(),
  revision: z.string(),
  batteryVoltage: z.number().nullable(),
  notes: z.string(),
  rootNet: z.string().nullable(),
  netCount: z.number().int(),
  componentCount: z.number().int(),
  pinCount: z.number().int(),
  createdAt: z.string(),
});
export type BoardSummary = z.infer<typeof boardSummarySchema>;

export const netRowSchema = z.object({
  name: z.string(),
  normalizedName: z.string(),
  kind: netKindSchema,
  nominalVoltage: z.number().nullable(),
  description: z.string(),
  aliases: z.array(z.string()),
  componentCount: z.number().int(),
  pinCount: z.number().int(),
});
export type NetRow = z.infer<typeof netRowSchema>;

export const pinRowSchema = z.object({
  pin: z.string(),
  net: z.string().nullable(),
  x: z.number().nullable(),
  y: z.number().nullable(),
});
export type PinRow = z.infer<typeof pinRowSchema>;

export const componentRowSchema = z.object({
  refdes: z.string(),
  kind: componentKindSchema,
  value: z.string(),
  magnitude: z.number().nullable(),
  unit: z.string().nullable(),
  tolerance: z.number().nullable(),
  ratedVoltage: z.number().nullable(),
  package: z.string(),
  side: boardSideSchema.nullable(),
  x: z.number().nullable(),
  y: z.number().nullable(),
  rotation: z.number().nullable(),
  pins: z.array(pinRowSchema),
});
export type ComponentRow = z.infer<typeof componentRowSchema>;

export const boardDetailSchema = boardSummarySchema.extend({
  netKindCounts: z.record(netKindSchema, z.number().int()),
  componentKindCounts: z.record(z.string(), z.number().int()),
  powerLinkCount: z.number().int(),
});
export type BoardDetail = z.infer<typeof boardDetailSchema>;

export const boardListResponseSchema = z.object({ boards: z.array(boardSummarySchema) });
export type BoardListResponse = z.infer<typeof boardListResponseSchema>;
export const netListResponseSchema = z.object({ board: z.string(), nets: z.array(netRowSchema) });
export type NetListResponse = z.infer<typeof netListResponseSchema>;
export const componentListResponseSchema = z.object({
  board: z.string(),
  net: z.string().nullable(),
  components: z.array(componentRowSchema),
});
export type ComponentListResponse = z.infer<typeof componentListResponseSchema>;

export const componentsQuerySchema = z.strictObject({
  net: z.string().min(1).max(200).optional(),
});

/**
 * A refdes as it comes in a URL. The importers take up to 200 characters of any kind, so only what
 * no netlist holds is refused: nothing, more than that, surrounding spaces, control characters.
 */
export const refdesParamSchema = z
  .string()
  .min(1, 'give the reference designator')
  .max(200, 'a reference designator has at most 200 characters')
  .refine((refdes) => refdes.trim() === refdes, 'a reference designator has no surrounding spaces')
  .refine(
    (refdes) => !/[\u0000-\u001f\u007f]/.test(refdes),
    'a reference designator has no control characters',
  );

export const componentParamsSchema = z.object({ slug: boardSlugSchema, refdes: refdesParamSchema });

/** One pin of a part with what the technician needs of its net before probing it. */
export const componentPinSchema = z.object({
  pin: z.string(),
  /** null when the pin is not connected */
  net: z.string().nullable(),
  netKind: netKindSchema.nullable(),
  /** true when the pin's net is ground: readings on the other pins are taken against it */
  ground: z.boolean(),
  nominalVoltage: z.number().nullable(),
  x: z.number().nullable(),
  y: z.number().nullable(),
});
export type ComponentPin = z.infer<typeof componentPinSchema>;

/** `GET /api/boards/:slug/components/:refdes`: a part, its pins in natural order, its casebook record. */
export const componentDetailSchema = z.object({
  board: boardSlugSchema,
  component: componentRowSchema.omit({ pins: true }).extend({ pins: z.array(componentPinSchema) }),
  /** the power links that pass through the part (it is the converter, switch or series part between them) */
  powerLinks: z.array(
    z.object({
      from: z.string(),
      to: z.string(),
      kind: powerLinkKindSchema,
      origin: powerLinkOriginSchema,
    }),
  ),
  casebook: z.object({
    /** published cases, neither hidden nor merged away, that name the part */
    cases: z.number().int(),
    /** solved published cases that name it as the culprit */
    solvedAsCulprit: z.number().int(),
  }),
});
export type ComponentDetail = z.infer<typeof componentDetailSchema>;

/** A rectangle on the board, millimetres, x to the right and y up as in the netlist. */
export const boardBoxSchema = z.object({
  x0: z.number(),
  y0: z.number(),
  x1: z.number(),
  y1: z.number(),
});
export type BoardBox = z.infer<typeof boardBoxSchema>;

/**
 * `GET /api/boards/:slug/placement`: where each part sits. A part is the box around its pins' centres
 * widened by half a pad (netlists hold no pad or body sizes); the outline is the box around all parts.
 */
export const boardPlacementSchema = z.object({
  board: boardSlugSchema,
  units: z.literal('mm'),
  outline: boardBoxSchema.nullable(),
  parts: z.array(
    boardBoxSchema.extend({
      refdes: z.string(),
      kind: componentKindSchema,
      side: boardSideSchema.nullable(),
    }),
  ),
  /** refdes of parts the netlist gives no position for */
  unplaced: z.array(z.string()),
});
export type BoardPlacement = z.infer<typeof boardPlacementSchema>;
