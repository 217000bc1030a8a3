// The casebook: repair write-ups (cases) on a board, their readings and linked nets and parts, votes,
// "this worked for me" confirmations, comments and revisions. The API and the web client share these.
import { z } from 'zod';
import { boardSlugSchema } from './board';

export const caseStatuses = ['draft', 'published'] as const;
export const caseStatusSchema = z.enum(caseStatuses);
export type CaseStatus = z.infer<typeof caseStatusSchema>;

export const caseOutcomes = ['solved', 'not_solved', 'partly'] as const;
export const caseOutcomeSchema = z.enum(caseOutcomes);
export type CaseOutcome = z.infer<typeof caseOutcomeSchema>;

/** diode mode in volts, resistance to ground in ohms, voltage in volts */
export const readingModes = ['diode_v', 'resistance_ohm', 'voltage_v'] as const;
export const readingModeSchema = z.enum(readingModes);
export type ReadingMode = z.infer<typeof readingModeSchema>;

export const caseLimits = {
  title: 200,
  symptom: 2000,
  rootCause: 5000,
  fixSteps: 10_000,
  body: 50_000,
  readings: 100,
  nets: 50,
  components: 50,
  comment: 10_000,
  confirmationNote: 1000,
  query: 200,
  pageSize: 50,
} as const;

const netName = z.string().trim().min(1, 'give the net name').max(200);
const refdes = z.string().trim().min(1, 'give the reference designator').max(64);
/** a meter value: finite, and far inside what any bench meter shows */
const meterValue = z.number().finite().min(-1e9).max(1e9);

export const caseReadingInputSchema = z.strictObject({
  net: netName,
  mode: readingModeSchema,
  measured: meterValue,
  knownGood: meterValue.nullable().default(null),
});
export type CaseReadingInput = z.infer<typeof caseReadingInputSchema>;

export const caseComponentInputSchema = z.strictObject({
  refdes,
  /** the part that was at fault and got replaced or removed */
  culprit: z.boolean().default(false),
});
export type CaseComponentInput = z.infer<typeof caseComponentInputSchema>;

const text = (max: number) => z.string().max(max, `keep it under ${max.toLocaleString('en')} characters`);

function noRepeats<T>(key: (item: T) => string, what: string) {
  return (items: T[], ctx: z.RefinementCtx) => {
    const seen = new Set<string>();
    items.forEach((item, index) => {
      const k = key(item);
      if (seen.has(k)) ctx.addIssue({ code: 'custom', path: [index], message: `${what} ${k} is listed twice` });
      seen.add(k);
    });
  };
}

const caseFields = {
  title: z.string().trim().min(5, 'give a title of at least 5 characters').max(caseLimits.title),
  symptom: z.string().trim().min(3, 'describe the symptom').max(caseLimits.symptom),
  rootCause: text(caseLimits.rootCause),
  fixSteps: text(caseLimits.fixSteps),
  body: text(caseLimits.body),
  outcome: caseOutcomeSchema,
  minutesSpent: z.number().int('whole minutes').min(0).max(100_000).nullable(),
  readings: z.array(caseReadingInputSchema).max(caseLimits.readings),
  nets: z
    .array(netName)
    .max(caseLimits.nets)
    .superRefine(noRepeats((n: string) => n, 'net')),
  components: z
    .array(caseComponentInputSchema)
    .max(caseLimits.components)
    .superRefine(noRepeats((c: CaseComponentInput) => c.refdes, 'part')),
};

export const caseCreateSchema = z.strictObject({
  status: caseStatusSchema.default('draft'),
  title: caseFields.title,
  symptom: caseFields.symptom,
  rootCause: caseFields.rootCause.default(''),
  fixSteps: caseFields.fixSteps.default(''),
  body: caseFields.body.default(''),
  outcome: caseFields.outcome,
  minutesSpent: caseFields.minutesSpent.default(null),
  readings: caseFields.readings.default([]),
  nets: caseFields.nets.default([]),
  components: caseFields.components.default([]),
});
export type CaseCreate = z.infer<typeof caseCreateSchema>;

/** Every field optional; lists given replace the case's lists. Publishing is one way: a published case stays published. */
export const caseUpdateSchema = z
  .strictObject({
    status: caseStatusSchema.optional(),
    title: caseFields.title.optional(),
    symptom: caseFields.symptom.optional(),
    rootCause: caseFields.rootCause.optional(),
    fixSteps: caseFields.fixSteps.optional(),
    body: caseFields.body.optional(),
    outcome: caseFields.outcome.optional(),
    minutesSpent: caseFields.minutesSpent.optional(),
    readings: caseFields.readings.optional(),
    nets: caseFields.nets.optional(),
    components: caseFields.components.optional(),
  })
  .refine((v) => Object.values(v).some((field) => field !== undefined), { message: 'change at least one field' });
export type CaseUpdate = z.infer<typeof caseUpdateSchema>;

export const caseSorts = ['rank', 'relevance', 'newest'] as const;
export const caseSortSchema = z.enum(caseSorts);
export type CaseSort = z.infer<typeof caseSortSchema>;

const page = z.coerce.number().int().min(1).max(10_000).default(1);
const pageSize = z.coerce.number().int().min(1).max(caseLimits.pageSize, `at most ${caseLimits.pageSize} per page`).default(20);

export const caseListQuerySchema = z.strictObject({
  net: netName.optional(),
  component: refdes.optional(),
  outcome: caseOutcomeSchema.optional(),
  q: z.string().trim().min(1).max(caseLimits.query).optional(),
  /** default: relevance when q is given, rank otherwise */
  sort: caseSortSchema.optional(),
  /** draft lists only the caller's own drafts */
  status: caseStatusSchema.default('published'),
  page,
  pageSize,
});
export type CaseListQuery = z.infer<typeof caseListQuerySchema>;

export const casePageQuerySchema = z.strictObject({ page, pageSize });
export type CasePageQuery = z.infer<typeof casePageQuerySchema>;

const commaList = (item: z.ZodString, max: number) =>
  z
    .string()
    .max(2000)
    .transform((v) => [...new Set(v.split(',').map((s) => s.trim()).filter((s) => s !== ''))])
    .pipe(z.array(item).max(max));

export const similarCasesQuerySchema = z
  .strictObject({
    nets: commaList(netName, caseLimits.nets).optional(),
    components: commaList(refdes, caseLimits.components).optional(),
    text: z.string().trim().max(caseLimits.symptom).optional(),
    /** the case being edited, left out of its own duplicates */
    exclude: z.coerce.number().int().positive().max(2_147_483_647).optional(),
    limit: z.coerce.number().int().min(1).max(20).default(5),
  })
  .refine((v) => (v.nets?.length ?? 0) > 0 || (v.components?.length ?? 0) > 0 || (v.text ?? '') !== '', {
    message: 'give nets, components or text to compare with',
  });
export type SimilarCasesQuery = z.infer<typeof similarCasesQuerySchema>;

export const caseVoteInputSchema = z.strictObject({
  value: z.union([z.literal(1), z.literal(-1)], { error: 'vote 1 (up) or -1 (down)' }),
});
export type CaseVoteInput = z.infer<typeof caseVoteInputSchema>;

export const caseConfirmationInputSchema = z.strictObject({
  note: z.string().trim().max(caseLimits.confirmationNote).default(''),
});
export type CaseConfirmationInput = z.infer<typeof caseConfirmationInputSchema>;

export const commentInputSchema = z.strictObject({
  body: z.string().trim().min(1, 'write something').max(caseLimits.comment),
});
export type CommentInput = z.infer<typeof commentInputSchema>;

/** a moderator changing someone else's comment says why (kept in the audit log) */
const moderationReason = z.string().trim().max(500).default('');

export const commentUpdateSchema = commentInputSchema.extend({ reason: moderationReason });
export type CommentUpdate = z.infer<typeof commentUpdateSchema>;

export const commentDeleteQuerySchema = z.strictObject({ reason: moderationReason });

/** a row id in a path (case, comment): a positive PostgreSQL integer */
export const idParamSchema = z.coerce.number().int().positive().max(2_147_483_647);

// ---- answers ----

export const casePersonSchema = z.object({ id: z.number().int(), login: z.string(), name: z.string() });
export type CasePerson = z.infer<typeof casePersonSchema>;

export const caseScoreSchema = z.object({
  ups: z.number().int(),
  downs: z.number().int(),
  confirmations: z.number().int(),
  /** Wilson lower bound at 95 %, each person counted once (see packages/vote-ranking) */
  wilsonLowerBound: z.number(),
  myVote: z.union([z.literal(1), z.literal(-1)]).nullable(),
  confirmedByMe: z.boolean(),
});
export type CaseScore = z.infer<typeof caseScoreSchema>;

export const caseSummarySchema = z.object({
  id: z.number().int(),
  board: z.object({ slug: boardSlugSchema, title: z.string() }),
  status: caseStatusSchema,
  title: z.string(),
  symptom: z.string(),
  outcome: caseOutcomeSchema,
  minutesSpent: z.number().int().nullable(),
  author: casePersonSchema,
  nets: z.array(z.string()),
  culprits: z.array(z.string()),
  commentCount: z.number().int(),
  score: caseScoreSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  publishedAt: z.string().nullable(),
});
export type CaseSummary = z.infer<typeof caseSummarySchema>;

export const caseReadingSchema = z.object({
  position: z.number().int(),
  net: z.string(),
  mode: readingModeSchema,
  measured: z.number(),
  knownGood: z.number().nullable(),
});
export type CaseReading = z.infer<typeof caseReadingSchema>;

/** Moderation state of a case; hidden cases reach only moderators and their author. */
export const caseModerationStateSchema = z.object({
  lockedAt: z.string().nullable(),
  hiddenAt: z.string().nullable(),
  /** why a moderator hid it; empty when it is not hidden */
  hiddenReason: z.string(),
});
export type CaseModerationState = z.infer<typeof caseModerationStateSchema>;

export const caseDetailSchema = caseSummarySchema.extend({
  /** always sent by the API (optional only for older clients' fixtures) */
  moderation: caseModerationStateSchema.optional(),
  /** the cases merged into this one (newest first), so readers of an old link know where they are */
  mergedFrom: z.array(z.object({ id: z.number().int(), title: z.string() })).optional(),
  rootCause: z.string(),
  fixSteps: z.string(),
  body: z.string(),
  /** sanitised HTML of the Markdown fields, with the board's net names and refdes linked */
  html: z.object({ rootCause: z.string(), fixSteps: z.string(), body: z.string() }),
  author: casePersonSchema.extend({ reputation: z.number().int() }),
  readings: z.array(caseReadingSchema),
  components: z.array(z.object({ refdes: z.string(), culprit: z.boolean() })),
});
export type CaseDetail = z.infer<typeof caseDetailSchema>;

export const caseListResponseSchema = z.object({
  board: boardSlugSchema,
  page: z.number().int(),
  pageSize: z.number().int(),
  total: z.number().int(),
  sort: caseSortSchema,
  cases: z.array(caseSummarySchema.extend({ relevance: z.number().nullable() })),
});
export type CaseListResponse = z.infer<typeof caseListResponseSchema>;

export const similarCaseSchema = caseSummarySchema.extend({
  why: z.object({
    /** nets both cases name */
    nets: z.array(z.string()),
    /** parts asked about that this case names as the culprit */
    culprits: z.array(z.string()),
    /** text similarity 0–1 (PostgreSQL ts_rank_cd and pg_trgm), null when no text was given */
    text: z.number().nullable(),
  }),
});
export type SimilarCase = z.infer<typeof similarCaseSchema>;

/** Every field and link of a case at one revision. */
const caseSnapshotFieldsSchema = z.object({
  status: caseStatusSchema,
  title: z.string(),
  symptom: z.string(),
  rootCause: z.string(),
  fixSteps: z.string(),
  body: z.string(),
  outcome: caseOutcomeSchema,
  minutesSpent: z.number().int().nullable(),
  readings: z.array(caseReadingInputSchema),
  nets: z.array(z.string()),
  components: z.array(z.object({ refdes: z.string(), culprit: z.boolean() })),
});

export const caseRevisionSnapshotSchema = caseSnapshotFieldsSchema.extend({
  /** on the revision a merge wrote: the duplicate's own text and links as they were when merged */
  merged: z.object({ caseId: z.number().int(), snapshot: caseSnapshotFieldsSchema }).optional(),
});
export type CaseRevisionSnapshot = z.infer<typeof caseRevisionSnapshotSchema>;

export const caseRevisionSchema = z.object({
  id: z.number().int(),
  editor: casePersonSchema,
  createdAt: z.string(),
  /** the fields this revision changed, in field order; every field for the first revision */
  changed: z.array(z.string()),
  summary: z.string(),
  snapshot: caseRevisionSnapshotSchema,
});
export type CaseRevision = z.infer<typeof caseRevisionSchema>;

export const caseCommentSchema = z.object({
  id: z.number().int(),
  caseId: z.number().int(),
  author: casePersonSchema,
  /** empty once deleted */
  body: z.string(),
  html: z.string(),
  createdAt: z.string(),
  editedAt: z.string().nullable(),
  deleted: z.boolean(),
  /** set when a moderator hid it (only moderators and the comment's author receive hidden comments) */
  hidden: z.object({ at: z.string(), reason: z.string() }).nullable().optional(),
});
export type CaseComment = z.infer<typeof caseCommentSchema>;

/** Why a moderator locks, hides, restores or resolves, or why a member flags: kept in the audit log. */
const requiredReason = z.string().trim().min(3, 'say why, in a few words').max(500);

export const moderationInputSchema = z.strictObject({ reason: requiredReason });
export type ModerationInput = z.infer<typeof moderationInputSchema>;

/** A moderator folds a duplicate case (the one in the URL) into `intoCaseId`, a case on the same board. */
export const caseMergeInputSchema = z.strictObject({
  intoCaseId: z.number().int().positive().max(2_147_483_647),
  reason: requiredReason,
});
export type CaseMergeInput = z.infer<typeof caseMergeInputSchema>;

/** Rows of each kind a merge moved from the duplicate to the kept case, or left on the duplicate. */
export const caseMergeCountsSchema = z.object({
  nets: z.number().int(),
  components: z.number().int(),
  readings: z.number().int(),
  attachments: z.number().int(),
  comments: z.number().int(),
  confirmations: z.number().int(),
  votes: z.number().int(),
});
export type CaseMergeCounts = z.infer<typeof caseMergeCountsSchema>;

export const caseMergeSummarySchema = z.object({
  /** the audit row that records the merge; an admin undoes the merge through it */
  auditId: z.number().int(),
  fromCaseId: z.number().int(),
  intoCaseId: z.number().int(),
  moved: caseMergeCountsSchema,
  /**
   * rows that stay on the duplicate because the kept case already has their like: a second vote or
   * confirmation by the same person, a net or part the kept case already links. Nothing is deleted.
   */
  keptOnDuplicate: caseMergeCountsSchema,
});
export type CaseMergeSummary = z.infer<typeof caseMergeSummarySchema>;

export const flagContentTypes = ['case', 'comment'] as const;
export const flagStatuses = ['open', 'resolved'] as const;

export const flagListQuerySchema = z.strictObject({ status: z.enum(flagStatuses).default('open') });
export type FlagListQuery = z.infer<typeof flagListQuerySchema>;

export const caseFlagSchema = z.object({
  id: z.number().int(),
  contentType: z.enum(flagContentTypes),
  contentId: z.number().int(),
  /** the flagged case, or the case of the flagged comment */
  caseId: z.number().int().nullable(),
  flagger: casePersonSchema,
  reason: z.string(),
  status: z.enum(flagStatuses),
  resolver: casePersonSchema.nullable(),
  resolution: z.string(),
  createdAt: z.string(),
  resolvedAt: z.string().nullable(),
});
export type CaseFlag = z.infer<typeof caseFlagSchema>;

export const caseConfirmationSchema = z.object({
  caseId: z.number().int(),
  user: casePersonSchema,
  note: z.string(),
  createdAt: z.string(),
});
export type CaseConfirmation = z.infer<typeof caseConfirmationSchema>;
