// Railyard's own JSON formats: a whole board, and annotations laid over a netlist.
// Documented in docs/formats.md.
import { z } from 'zod';
import {
  boardMetaSchema,
  boardSideSchema,
  componentKindSchema,
  netKindSchema,
  powerLinkKindSchema,
} from './board';

const name = z.string().trim().min(1).max(200);

export const netAnnotationSchema = z.strictObject({
  name,
  kind: netKindSchema.optional(),
  nominalVoltage: z.number().min(-1000).max(1000).nullable().optional(),
  description: z.string().max(2000).optional(),
  aliases: z.array(name).max(50).optional(),
});
export type NetAnnotation = z.infer<typeof netAnnotationSchema>;

export const powerLinkInputSchema = z.strictObject({
  from: name,
  to: name,
  /** refdes of the part the power passes through */
  via: name,
  kind: powerLinkKindSchema,
});
export type PowerLinkInput = z.infer<typeof powerLinkInputSchema>;

export const boardFilePinSchema = z.strictObject({
  pin: z.string().trim().min(1).max(40),
  net: name.nullable(),
  x: z.number().finite().optional(),
  y: z.number().finite().optional(),
});

export const boardFileComponentSchema = z.strictObject({
  refdes: name,
  kind: componentKindSchema.optional(),
  value: z.string().max(200).optional(),
  package: z.string().max(100).optional(),
  side: boardSideSchema.optional(),
  x: z.number().finite().optional(),
  y: z.number().finite().optional(),
  rotation: z.number().finite().optional(),
  pins: z.array(boardFilePinSchema).min(1).max(5000),
});
export type BoardFileComponent = z.infer<typeof boardFileComponentSchema>;

/** `railyard-board` v1: a whole board in one file (coordinates in millimetres). */
export const boardFileSchema = z.strictObject({
  format: z.literal('railyard-board'),
  version: z.literal(1),
  board: boardMetaSchema.partial().optional(),
  rootNet: name.optional(),
  nets: z.array(netAnnotationSchema).max(200_000).default([]),
  components: z.array(boardFileComponentSchema).min(1).max(200_000),
  powerLinks: z.array(powerLinkInputSchema).max(200_000).default([]),
});
export type BoardFile = z.infer<typeof boardFileSchema>;

/** `railyard-annotations` v1: what a netlist lacks — metadata, voltages, converter and switch links. */
export const annotationFileSchema = z.strictObject({
  format: z.literal('railyard-annotations'),
  version: z.literal(1),
  board: boardMetaSchema.partial().optional(),
  rootNet: name.optional(),
  nets: z.array(netAnnotationSchema).max(200_000).default([]),
  components: z
    .array(
      z.strictObject({
        refdes: name,
        kind: componentKindSchema.optional(),
        value: z.string().max(200).optional(),
        package: z.string().max(100).optional(),
      }),
    )
    .max(200_000)
    .default([]),
  powerLinks: z.array(powerLinkInputSchema).max(200_000).default([]),
});
export type AnnotationFile = z.infer<typeof annotationFileSchema>;
