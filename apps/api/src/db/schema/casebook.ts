// The casebook: repair write-ups on a board with their readings, linked nets and parts, revisions,
// votes, confirmations and comments, and moderation (locks, hidden content, flags, merges).
import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  boolean,
  check,
  customType,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  smallint,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import { caseOutcomes, caseStatuses, readingModes, type CaseRevisionSnapshot } from '@railyard/shared';
import { boards, components, nets } from './boards';
import { createdAt, id } from './columns';
import { users } from './users';

export const caseStatusEnum = pgEnum('case_status', caseStatuses);
export const caseOutcomeEnum = pgEnum('case_outcome', caseOutcomes);
export const readingModeEnum = pgEnum('reading_mode', readingModes);

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });
const updatedAt = () => timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow();
/** The case a row belongs to; the row goes with the case. */
const caseRef = () =>
  integer()
    .notNull()
    .references((): AnyPgColumn => cases.id, { onDelete: 'cascade' });

export const cases = pgTable(
  'cases',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    authorId: integer()
      .notNull()
      .references(() => users.id),
    status: caseStatusEnum().notNull().default('draft'),
    title: text().notNull(),
    symptom: text().notNull(),
    rootCause: text().notNull().default(''),
    fixSteps: text().notNull().default(''),
    /** Markdown */
    body: text().notNull().default(''),
    outcome: caseOutcomeEnum().notNull(),
    minutesSpent: integer(),
    /** names of the linked nets and parts and of the nets read: a generated column cannot join other tables */
    searchText: text().notNull().default(''),
    // 'simple' configuration: net names and refdes must not be stemmed or dropped as stop words
    search: tsvector()
      .notNull()
      .generatedAlwaysAs(
        sql`setweight(to_tsvector('simple', "title"), 'A') || setweight(to_tsvector('simple', "symptom"), 'B') || setweight(to_tsvector('simple', "root_cause" || ' ' || "fix_steps" || ' ' || "body" || ' ' || "search_text"), 'C')`,
      ),
    /** kept by the casebook repository with each vote or confirmation, from packages/vote-ranking */
    upVotes: integer().notNull().default(0),
    downVotes: integer().notNull().default(0),
    confirmationCount: integer().notNull().default(0),
    rankScore: doublePrecision().notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    publishedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** a locked case takes no new comments, votes or edits */
    lockedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** a hidden case is visible only to moderators and its author */
    hiddenAt: timestamp({ withTimezone: true, mode: 'date' }),
    hiddenReason: text().notNull().default(''),
    /** set when a moderator merged this case into another; its URL then points there */
    mergedIntoId: integer().references((): AnyPgColumn => cases.id, { onDelete: 'set null' }),
  },
  (t) => [
    index('cases_board_rank_idx').on(t.boardId, t.status, t.rankScore.desc()),
    index('cases_board_published_idx').on(t.boardId, t.status, t.publishedAt.desc()),
    index('cases_author_idx').on(t.authorId),
    index('cases_search_idx').using('gin', t.search),
  ],
);

export const caseReadings = pgTable(
  'case_readings',
  {
    id: id(),
    caseId: caseRef(),
    position: integer().notNull(),
    /** as printed on the board when entered; kept as text so a replaced netlist does not lose it */
    netName: text().notNull(),
    mode: readingModeEnum().notNull(),
    measured: doublePrecision().notNull(),
    knownGood: doublePrecision(),
  },
  (t) => [uniqueIndex('case_readings_case_position_key').on(t.caseId, t.position)],
);

export const caseNets = pgTable(
  'case_nets',
  {
    id: id(),
    caseId: caseRef(),
    netId: integer()
      .notNull()
      .references(() => nets.id, { onDelete: 'cascade' }),
  },
  (t) => [uniqueIndex('case_nets_case_net_key').on(t.caseId, t.netId), index('case_nets_net_idx').on(t.netId)],
);

export const caseComponents = pgTable(
  'case_components',
  {
    id: id(),
    caseId: caseRef(),
    componentId: integer()
      .notNull()
      .references(() => components.id, { onDelete: 'cascade' }),
    culprit: boolean().notNull().default(false),
  },
  (t) => [
    uniqueIndex('case_components_case_component_key').on(t.caseId, t.componentId),
    index('case_components_component_idx').on(t.componentId, t.culprit),
  ],
);

export const caseRevisions = pgTable(
  'case_revisions',
  {
    id: id(),
    caseId: caseRef(),
    editorId: integer()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    /** every field and link as they were after this revision */
    snapshot: jsonb().$type<CaseRevisionSnapshot>().notNull(),
    changed: text().array().notNull().default(sql`'{}'::text[]`),
    summary: text().notNull(),
  },
  (t) => [index('case_revisions_case_idx').on(t.caseId, t.id)],
);

export const caseVotes = pgTable(
  'case_votes',
  {
    id: id(),
    caseId: caseRef(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    value: smallint().notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // one vote per person and case: concurrent votes meet here (INSERT … ON CONFLICT DO UPDATE)
    uniqueIndex('case_votes_case_user_key').on(t.caseId, t.userId),
    index('case_votes_user_idx').on(t.userId),
    check('case_votes_value_check', sql`${t.value} IN (-1, 1)`),
  ],
);

export const caseConfirmations = pgTable(
  'case_confirmations',
  {
    id: id(),
    caseId: caseRef(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    note: text().notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('case_confirmations_case_user_key').on(t.caseId, t.userId)],
);

export const caseComments = pgTable(
  'case_comments',
  {
    id: id(),
    caseId: caseRef(),
    authorId: integer()
      .notNull()
      .references(() => users.id),
    /** Markdown; kept after a (soft) delete for moderators, never shown again */
    body: text().notNull(),
    createdAt: createdAt(),
    editedAt: timestamp({ withTimezone: true, mode: 'date' }),
    deletedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** hidden by a moderator: shown to moderators and the comment's author only */
    hiddenAt: timestamp({ withTimezone: true, mode: 'date' }),
    hiddenReason: text().notNull().default(''),
  },
  (t) => [index('case_comments_case_idx').on(t.caseId, t.createdAt)],
);

export const flagContentTypeEnum = pgEnum('flag_content_type', ['case', 'comment']);
export const flagStatusEnum = pgEnum('flag_status', ['open', 'resolved']);

/** A member's report of a case or comment for moderators to look at. */
export const caseFlags = pgTable(
  'case_flags',
  {
    id: id(),
    contentType: flagContentTypeEnum().notNull(),
    /** the case's or the comment's id, after content_type */
    contentId: integer().notNull(),
    flaggerId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    reason: text().notNull(),
    status: flagStatusEnum().notNull().default('open'),
    resolverId: integer().references(() => users.id),
    resolution: text().notNull().default(''),
    createdAt: createdAt(),
    resolvedAt: timestamp({ withTimezone: true, mode: 'date' }),
  },
  (t) => [
    // one open flag per person and item: a second report while the first is open is a conflict
    uniqueIndex('case_flags_open_key').on(t.contentType, t.contentId, t.flaggerId).where(sql`${t.status} = 'open'`),
    index('case_flags_status_idx').on(t.status, t.createdAt),
  ],
);
