// What moderators edit on a board's power tree: links, net annotations, the root.
import { z } from 'zod';
import { netKindSchema } from './board';

const netName = z.string().trim().min(1).max(200);
const reason = z.string().trim().max(500).default('');

export const powerLinkCreateSchema = z.strictObject({
  from: netName,
  to: netName,
  via: z.string().trim().min(1).max(200),
  kind: z.enum(['converter', 'switch', 'series']),
  reason,
});
export type PowerLinkCreate = z.infer<typeof powerLinkCreateSchema>;

export const netUpdateSchema = z
  .strictObject({
    nominalVoltage: z.number().min(-1000).max(1000).nullable().optional(),
    description: z.string().max(2000).optional(),
    kind: netKindSchema.optional(),
    reason,
  })
  .refine((v) => v.nominalVoltage !== undefined || v.description !== undefined || v.kind !== undefined, {
    message: 'change the nominal voltage, the description or the kind',
  });
export type NetUpdate = z.infer<typeof netUpdateSchema>;

export const rootNetUpdateSchema = z.strictObject({ net: netName, reason });
export type RootNetUpdate = z.infer<typeof rootNetUpdateSchema>;

export const powerLinkRowSchema = z.object({
  id: z.number().int(),
  from: z.string(),
  to: z.string(),
  via: z.string(),
  kind: z.enum(['converter', 'switch', 'series']),
  origin: z.enum(['derived', 'entered']),
  enteredBy: z.string().nullable(),
});
export type PowerLinkRow = z.infer<typeof powerLinkRowSchema>;
