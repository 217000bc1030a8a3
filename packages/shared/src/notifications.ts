// How people get notification e-mails, and the development mailbox's messages.
import { z } from 'zod';

export const notificationModes = ['off', 'immediate', 'daily_digest'] as const;
export const notificationModeSchema = z.enum(notificationModes);
export type NotificationMode = z.infer<typeof notificationModeSchema>;
/** Someone who never chose gets each notification as it happens. */
export const defaultNotificationMode: NotificationMode = 'immediate';

/** PUT /api/me/notifications */
export const notificationPreferencesInputSchema = z.strictObject({ mode: notificationModeSchema });
export type NotificationPreferencesInput = z.infer<typeof notificationPreferencesInputSchema>;

/** GET and PUT /api/me/notifications answer this. */
export const notificationSettingsSchema = z.object({
  mode: notificationModeSchema,
  /** where the mails go (the verified primary address from sign-in); null means none can be sent */
  email: z.string().nullable(),
});
export type NotificationSettings = z.infer<typeof notificationSettingsSchema>;

/** One message the development mail catcher kept (GET /api/dev/mailbox). */
export const caughtMailSchema = z.object({
  id: z.number().int(),
  from: z.string(),
  /** header recipients (To and Cc) */
  to: z.array(z.string()),
  /** SMTP envelope recipients (RCPT TO), which is where the mail would really have gone */
  envelopeTo: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  /** the Date header */
  date: z.string().nullable(),
  receivedAt: z.string(),
});
export type CaughtMail = z.infer<typeof caughtMailSchema>;
