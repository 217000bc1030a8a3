// What a notification can be about, and the payload each kind carries. The payload is checked when the
// row is written, inside the caller's transaction, so a malformed one fails the action that made it
// instead of surfacing hours later in the worker.
import { z } from 'zod';

export const notificationKinds = [
  'case_commented',
  'case_confirmed',
  'case_merged',
  'content_flagged',
  'digest',
] as const;
export type NotificationKind = (typeof notificationKinds)[number];

/** skipped: deliberately not sent (notifications off, or no verified address); the row stays as a record */
export const notificationStatuses = ['pending', 'sent', 'failed', 'skipped'] as const;
export type NotificationStatus = (typeof notificationStatuses)[number];

// the modes are part of the API contract (packages/shared); the outbox's kinds and payloads are the API's own
export {
  defaultNotificationMode,
  notificationModes,
  notificationPreferencesInputSchema,
  type NotificationMode,
} from '@railyard/shared';

const id = z.number().int().positive();
const title = z.string().trim().min(1).max(300);
const personName = z.string().trim().min(1).max(100);
const note = z.string().max(2000);

export const caseCommentedPayloadSchema = z.strictObject({
  caseId: id,
  caseTitle: title,
  commentId: id,
  commenterName: personName,
  /** the start of the comment; the template shortens it further */
  excerpt: note,
});

export const caseConfirmedPayloadSchema = z.strictObject({
  caseId: id,
  caseTitle: title,
  confirmedByName: personName,
  note: note.optional(),
});

export const caseMergedPayloadSchema = z.strictObject({
  caseId: id,
  caseTitle: title,
  intoCaseId: id,
  intoCaseTitle: title,
  mergedByName: personName,
  reason: note.optional(),
});

export const contentFlaggedPayloadSchema = z.strictObject({
  caseId: id,
  caseTitle: title,
  target: z.enum(['case', 'comment']),
  commentId: id.optional(),
  flaggedByName: personName,
  reason: note,
});

export const payloadSchemas = {
  case_commented: caseCommentedPayloadSchema,
  case_confirmed: caseConfirmedPayloadSchema,
  case_merged: caseMergedPayloadSchema,
  content_flagged: contentFlaggedPayloadSchema,
} as const;

export type EventKind = keyof typeof payloadSchemas;
export type PayloadOf<K extends EventKind> = z.infer<(typeof payloadSchemas)[K]>;

export const digestItemSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    id,
    createdAt: z.string(),
    kind: z.literal('case_commented'),
    payload: caseCommentedPayloadSchema,
  }),
  z.strictObject({
    id,
    createdAt: z.string(),
    kind: z.literal('case_confirmed'),
    payload: caseConfirmedPayloadSchema,
  }),
  z.strictObject({
    id,
    createdAt: z.string(),
    kind: z.literal('case_merged'),
    payload: caseMergedPayloadSchema,
  }),
  z.strictObject({
    id,
    createdAt: z.string(),
    kind: z.literal('content_flagged'),
    payload: contentFlaggedPayloadSchema,
  }),
]);
export type DigestItem = z.infer<typeof digestItemSchema>;

export const digestPayloadSchema = z.strictObject({
  /** the start of the digest day (ISO 8601) */
  day: z.string(),
  items: z.array(digestItemSchema).min(1),
});
export type DigestPayload = z.infer<typeof digestPayloadSchema>;

/** One notification as the caller describes it: the kind and its matching payload. */
export type NotificationEvent = { [K in EventKind]: { kind: K; payload: PayloadOf<K> } }[EventKind];
export type NotificationMessage = NotificationEvent | { kind: 'digest'; payload: DigestPayload };

/** Checks a payload against its kind's schema; the error names the kind and the field. */
export function parseNotificationEvent(kind: string, payload: unknown): NotificationEvent {
  if (!(kind in payloadSchemas)) {
    throw new Error(
      `Unknown notification kind "${kind}" (expected one of ${Object.keys(payloadSchemas).join(', ')})`,
    );
  }
  const result = payloadSchemas[kind as EventKind].safeParse(payload);
  if (!result.success) {
    const issues = result.error.issues
      .map((i) => `${i.path.join('.') || '(payload)'}: ${i.message}`)
      .join('; ');
    throw new Error(`Invalid ${kind} notification payload: ${issues}`);
  }
  return { kind, payload: result.data } as NotificationEvent;
}

/** Reads a stored row back into a typed message (the worker checks again: rows may predate a schema change). */
export function parseStoredMessage(kind: NotificationKind, payload: unknown): NotificationMessage {
  if (kind === 'digest') {
    const result = digestPayloadSchema.safeParse(payload);
    if (!result.success)
      throw new Error(
        `Invalid digest payload: ${result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`,
      );
    return { kind, payload: result.data };
  }
  return parseNotificationEvent(kind, payload);
}
