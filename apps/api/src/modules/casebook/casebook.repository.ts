// The casebook's database access: cases with their readings and links, revisions, votes,
// confirmations and comments, full-text search. The only casebook code that talks to the database.
import { and, asc, desc, eq, sql, type SQL } from 'drizzle-orm';
import type {
  CaseComment,
  CaseMergeCounts,
  CaseFlag,
  CaseConfirmation,
  CaseOutcome,
  CaseReading,
  CaseRevision,
  CaseRevisionSnapshot,
  CaseSort,
  CaseStatus,
  CaseSummary,
  ReadingMode,
} from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { Database } from '../../db/client';
import {
  auditLog,
  caseComments,
  caseComponents,
  caseConfirmations,
  caseNets,
  caseReadings,
  caseRevisions,
  caseVotes,
  cases,
  users,
} from '../../db/schema';
import { writeAudit, type AuditRecord } from '../audit/audit.repository';
import {
  enqueueModeratorNotification,
  enqueueNotification,
  type EnqueueInput,
} from '../notifications/notifications.repository';
import type { CaseMergeMoves } from './case-merge-record';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
/** The database or an open transaction, for reads a transaction must make on its own snapshot. */
type Reader = Pick<Database, 'execute' | 'select'>;

/** one array parameter (drizzle would spread a plain array into a list of parameters) */
const arrayParam = (values: readonly (string | number)[]) => sql.param([...values]);

/** A case's own row, for access checks and edits. */
export interface CaseRecord {
  id: number;
  boardId: number;
  boardSlug: string;
  boardTitle: string;
  authorId: number;
  status: CaseStatus;
  title: string;
  symptom: string;
  rootCause: string;
  fixSteps: string;
  body: string;
  outcome: CaseOutcome;
  minutesSpent: number | null;
  publishedAt: Date | null;
  lockedAt: Date | null;
  hiddenAt: Date | null;
  hiddenReason: string;
  mergedIntoId: number | null;
}

/** What a moderator changes on a case: lock, hide, or the reverse. */
export type CaseModerationChange = Partial<Pick<CaseRecord, 'lockedAt' | 'hiddenAt' | 'hiddenReason'>>;

export interface CaseFields {
  status: CaseStatus;
  title: string;
  symptom: string;
  rootCause: string;
  fixSteps: string;
  body: string;
  outcome: CaseOutcome;
  minutesSpent: number | null;
}

/** Readings and links resolved against the board: what gets stored. */
export interface CaseLinks {
  readings: { net: string; mode: ReadingMode; measured: number; knownGood: number | null }[];
  nets: { id: number; name: string }[];
  components: { id: number; refdes: string; culprit: boolean }[];
  searchText: string;
}

export interface RevisionRecord {
  editorId: number;
  snapshot: CaseRevisionSnapshot;
  changed: string[];
  summary: string;
}

/** Counts and rank of a case from all its votes and confirmations (packages/vote-ranking). */
export type CaseScorer = (
  votes: { userId: number; value: 1 | -1 }[],
  confirmedBy: number[],
) => { ups: number; downs: number; confirmations: number; rankScore: number };

export interface CaseFilter {
  boardId: number;
  status: CaseStatus;
  /** only this author's cases (their drafts) */
  authorId?: number;
  netId?: number;
  componentId?: number;
  outcome?: CaseOutcome;
  q?: string;
}

type SummaryRow = {
  id: number;
  board_slug: string;
  board_title: string;
  status: CaseStatus;
  title: string;
  symptom: string;
  outcome: CaseOutcome;
  minutes_spent: number | null;
  author_id: number;
  author_login: string;
  author_name: string;
  nets: string[];
  culprits: string[];
  comment_count: number;
  up_votes: number;
  down_votes: number;
  confirmation_count: number;
  rank_score: number;
  my_vote: number | null;
  confirmed_by_me: boolean;
  created_at: Date | string;
  updated_at: Date | string;
  published_at: Date | string | null;
  relevance?: number | null;
};

const iso = (value: Date | string) => new Date(value).toISOString();

function toSummary(row: SummaryRow): CaseSummary {
  return {
    id: row.id,
    board: { slug: row.board_slug, title: row.board_title },
    status: row.status,
    title: row.title,
    symptom: row.symptom,
    outcome: row.outcome,
    minutesSpent: row.minutes_spent,
    author: { id: row.author_id, login: row.author_login, name: row.author_name },
    nets: row.nets,
    culprits: row.culprits,
    commentCount: row.comment_count,
    score: {
      ups: row.up_votes,
      downs: row.down_votes,
      confirmations: row.confirmation_count,
      wilsonLowerBound: row.rank_score,
      myVote: row.my_vote === 1 || row.my_vote === -1 ? row.my_vote : null,
      confirmedByMe: row.confirmed_by_me,
    },
    createdAt: iso(row.created_at),
    updatedAt: iso(row.updated_at),
    publishedAt: row.published_at === null ? null : iso(row.published_at),
  };
}

/** Summary columns of `cases c JOIN boards b JOIN users u`, with the viewer's own vote and confirmation. */
function summaryColumns(viewerId: number | null): SQL {
  return sql`
    c.id, b.slug AS board_slug, b.title AS board_title, c.status, c.title, c.symptom, c.outcome,
    c.minutes_spent, u.id AS author_id, u.login AS author_login, u.name AS author_name,
    ARRAY(SELECT n.name FROM case_nets cn JOIN nets n ON n.id = cn.net_id WHERE cn.case_id = c.id ORDER BY n.name) AS nets,
    ARRAY(SELECT k.refdes FROM case_components cc JOIN components k ON k.id = cc.component_id
          WHERE cc.case_id = c.id AND cc.culprit ORDER BY k.refdes) AS culprits,
    (SELECT count(*) FROM case_comments m WHERE m.case_id = c.id AND m.deleted_at IS NULL)::int AS comment_count,
    c.up_votes, c.down_votes, c.confirmation_count, c.rank_score,
    (SELECT v.value FROM case_votes v WHERE v.case_id = c.id AND v.user_id = ${viewerId})::int AS my_vote,
    EXISTS (SELECT 1 FROM case_confirmations f WHERE f.case_id = c.id AND f.user_id = ${viewerId}) AS confirmed_by_me,
    c.created_at, c.updated_at, c.published_at`;
}

const summaryFrom = sql`FROM cases c JOIN boards b ON b.id = c.board_id JOIN users u ON u.id = c.author_id`;

function filterWhere(filter: CaseFilter, query: SQL | null): SQL {
  const parts: SQL[] = [sql`c.board_id = ${filter.boardId}`, sql`c.status = ${filter.status}`];
  if (filter.authorId !== undefined) parts.push(sql`c.author_id = ${filter.authorId}`);
  if (filter.netId !== undefined) {
    parts.push(sql`EXISTS (SELECT 1 FROM case_nets cn WHERE cn.case_id = c.id AND cn.net_id = ${filter.netId})`);
  }
  if (filter.componentId !== undefined) {
    parts.push(sql`EXISTS (SELECT 1 FROM case_components cc WHERE cc.case_id = c.id AND cc.component_id = ${filter.componentId})`);
  }
  if (filter.outcome !== undefined) parts.push(sql`c.outcome = ${filter.outcome}`);
  if (query) parts.push(sql`c.search @@ ${query}`);
  // hidden and merged-away cases are reached by their id only, never listed
  parts.push(sql`c.hidden_at IS NULL AND c.merged_into_id IS NULL`);
  return sql.join(parts, sql` AND `);
}

/** How many cases a list with this filter holds, counted as listCases counts its total. */
export async function countCases(runner: Reader, filter: CaseFilter): Promise<number> {
  const query = filter.q === undefined ? null : sql`websearch_to_tsquery('simple', ${filter.q}::text)`;
  const result = await runner.execute<{ total: number }>(sql`SELECT count(*)::int AS total FROM cases c WHERE ${filterWhere(filter, query)}`);
  return result.rows[0]?.total ?? 0;
}

/**
 * How many solved, published cases of the board name this part as the culprit. A merged-away case
 * is left out: the part it still names is one its kept case names too.
 */
export async function countSolvedAsCulprit(runner: Reader, componentId: number): Promise<number> {
  const result = await runner.execute<{ count: number }>(sql`
    SELECT count(*)::int AS count FROM case_components cc JOIN cases c ON c.id = cc.case_id
    WHERE cc.component_id = ${componentId} AND cc.culprit AND c.status = 'published' AND c.outcome = 'solved'
      AND c.hidden_at IS NULL AND c.merged_into_id IS NULL`);
  return result.rows[0]?.count ?? 0;
}

const orderings: Record<CaseSort, SQL> = {
  // ties: the newer write-up first, then the higher id, so pages never overlap
  rank: sql`c.rank_score DESC, c.published_at DESC NULLS LAST, c.id DESC`,
  relevance: sql`relevance DESC, c.rank_score DESC, c.id DESC`,
  newest: sql`c.published_at DESC NULLS LAST, c.updated_at DESC, c.id DESC`,
};

async function writeLinks(tx: Tx, caseId: number, links: CaseLinks) {
  await tx.delete(caseReadings).where(eq(caseReadings.caseId, caseId));
  await tx.delete(caseNets).where(eq(caseNets.caseId, caseId));
  await tx.delete(caseComponents).where(eq(caseComponents.caseId, caseId));
  if (links.readings.length > 0) {
    await tx.insert(caseReadings).values(
      links.readings.map((r, position) => ({
        caseId,
        position,
        netName: r.net,
        mode: r.mode,
        measured: r.measured,
        knownGood: r.knownGood,
      })),
    );
  }
  if (links.nets.length > 0) await tx.insert(caseNets).values(links.nets.map((n) => ({ caseId, netId: n.id })));
  if (links.components.length > 0) {
    await tx.insert(caseComponents).values(links.components.map((c) => ({ caseId, componentId: c.id, culprit: c.culprit })));
  }
}

async function rescore(tx: Tx, caseId: number, scorer: CaseScorer) {
  const votes = await tx.select({ userId: caseVotes.userId, value: caseVotes.value }).from(caseVotes).where(eq(caseVotes.caseId, caseId));
  const confirmations = await tx
    .select({ userId: caseConfirmations.userId })
    .from(caseConfirmations)
    .where(eq(caseConfirmations.caseId, caseId));
  const score = scorer(
    votes.map((v) => ({ userId: v.userId, value: v.value === 1 ? 1 : -1 })),
    confirmations.map((c) => c.userId),
  );
  await tx
    .update(cases)
    .set({ upVotes: score.ups, downVotes: score.downs, confirmationCount: score.confirmations, rankScore: score.rankScore })
    .where(eq(cases.id, caseId));
}

/**
 * Runs a change to a case's votes or confirmations and recounts, with the case row locked so that
 * concurrent votes on one case recount one after the other. NO KEY UPDATE leaves inserts of comments
 * and votes (which only take key-share locks on the case) unblocked.
 */
/**
 * Locks the case row for a change to what hangs off it and refuses a case merged away meanwhile: a merge
 * holds the row FOR UPDATE, so a vote, comment or attachment sent in the same instant waits for it and
 * then finds the case merged instead of landing on it after its rows moved.
 */
export async function lockUnmergedCase(
  tx: Tx,
  caseId: number,
  lock: 'no key update' | 'key share',
  /** what to tell the caller to do on the kept case instead */
  instead = 'make changes there',
) {
  const result = await tx.execute<{ merged_into_id: number | null }>(
    lock === 'no key update'
      ? sql`SELECT merged_into_id FROM cases WHERE id = ${caseId} FOR NO KEY UPDATE`
      : sql`SELECT merged_into_id FROM cases WHERE id = ${caseId} FOR KEY SHARE`,
  );
  const mergedInto = result.rows[0]?.merged_into_id ?? null;
  if (mergedInto !== null) {
    throw new AppError(409, 'case_merged', `Case ${caseId} was merged into case ${mergedInto}: ${instead}`, {
      mergedIntoId: mergedInto,
    });
  }
}

function changeEvidence<T>(db: Database, caseId: number, scorer: CaseScorer, change: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(async (tx) => {
    await lockUnmergedCase(tx, caseId, 'no key update');
    const result = await change(tx);
    await rescore(tx, caseId, scorer);
    return result;
  });
}

type CommentRow = {
  id: number;
  case_id: number;
  author_id: number;
  author_login: string;
  author_name: string;
  body: string;
  created_at: Date | string;
  edited_at: Date | string | null;
  deleted_at: Date | string | null;
  hidden_at: Date | string | null;
  hidden_reason: string;
};

export interface CommentRecord {
  id: number;
  caseId: number;
  authorId: number;
  body: string;
  deleted: boolean;
  hidden: boolean;
}

function toComment(row: CommentRow): Omit<CaseComment, 'html'> {
  const deleted = row.deleted_at !== null;
  return {
    id: row.id,
    caseId: row.case_id,
    author: { id: row.author_id, login: row.author_login, name: row.author_name },
    body: deleted ? '' : row.body,
    createdAt: iso(row.created_at),
    editedAt: row.edited_at === null ? null : iso(row.edited_at),
    deleted,
    hidden: row.hidden_at === null ? null : { at: iso(row.hidden_at), reason: row.hidden_reason },
  };
}

type FlagRow = {
  id: number;
  content_type: 'case' | 'comment';
  content_id: number;
  case_id: number | null;
  flagger_id: number;
  flagger_login: string;
  flagger_name: string;
  reason: string;
  status: 'open' | 'resolved';
  resolver_id: number | null;
  resolver_login: string | null;
  resolver_name: string | null;
  resolution: string;
  created_at: Date | string;
  resolved_at: Date | string | null;
};

function toFlag(row: FlagRow): CaseFlag {
  return {
    id: row.id,
    contentType: row.content_type,
    contentId: row.content_id,
    caseId: row.case_id,
    flagger: { id: row.flagger_id, login: row.flagger_login, name: row.flagger_name },
    reason: row.reason,
    status: row.status,
    resolver:
      row.resolver_id === null ? null : { id: row.resolver_id, login: row.resolver_login ?? '', name: row.resolver_name ?? '' },
    resolution: row.resolution,
    createdAt: iso(row.created_at),
    resolvedAt: row.resolved_at === null ? null : iso(row.resolved_at),
  };
}

const flagSelect = sql`
  SELECT f.id, f.content_type, f.content_id,
         CASE WHEN f.content_type = 'case' THEN f.content_id ELSE (SELECT m.case_id FROM case_comments m WHERE m.id = f.content_id) END AS case_id,
         f.flagger_id, fu.login AS flagger_login, fu.name AS flagger_name, f.reason, f.status,
         f.resolver_id, ru.login AS resolver_login, ru.name AS resolver_name, f.resolution, f.created_at, f.resolved_at
  FROM case_flags f JOIN users fu ON fu.id = f.flagger_id LEFT JOIN users ru ON ru.id = f.resolver_id`;

async function selectCase(runner: Reader, caseId: number): Promise<CaseRecord | null> {
  const result = await runner.execute<{
    id: number;
    board_id: number;
    board_slug: string;
    board_title: string;
    author_id: number;
    status: CaseStatus;
    title: string;
    symptom: string;
    root_cause: string;
    fix_steps: string;
    body: string;
    outcome: CaseOutcome;
    minutes_spent: number | null;
    published_at: Date | string | null;
    locked_at: Date | string | null;
    hidden_at: Date | string | null;
    hidden_reason: string;
    merged_into_id: number | null;
  }>(sql`
    SELECT c.id, c.board_id, b.slug AS board_slug, b.title AS board_title, c.author_id, c.status, c.title,
           c.symptom, c.root_cause, c.fix_steps, c.body, c.outcome, c.minutes_spent, c.published_at,
           c.locked_at, c.hidden_at, c.hidden_reason, c.merged_into_id
    FROM cases c JOIN boards b ON b.id = c.board_id WHERE c.id = ${caseId}`);
  const r = result.rows[0];
  if (!r) return null;
  return {
    id: r.id,
    boardId: r.board_id,
    boardSlug: r.board_slug,
    boardTitle: r.board_title,
    authorId: r.author_id,
    status: r.status,
    title: r.title,
    symptom: r.symptom,
    rootCause: r.root_cause,
    fixSteps: r.fix_steps,
    body: r.body,
    outcome: r.outcome,
    minutesSpent: r.minutes_spent,
    publishedAt: r.published_at === null ? null : new Date(r.published_at),
    lockedAt: r.locked_at === null ? null : new Date(r.locked_at),
    hiddenAt: r.hidden_at === null ? null : new Date(r.hidden_at),
    hiddenReason: r.hidden_reason,
    mergedIntoId: r.merged_into_id,
  };
}

async function selectReadings(runner: Reader, caseId: number): Promise<CaseReading[]> {
  const rows = await runner.select().from(caseReadings).where(eq(caseReadings.caseId, caseId)).orderBy(asc(caseReadings.position));
  return rows.map((r) => ({ position: r.position, net: r.netName, mode: r.mode, measured: r.measured, knownGood: r.knownGood }));
}

async function selectComponents(runner: Reader, caseId: number): Promise<{ refdes: string; culprit: boolean }[]> {
  const result = await runner.execute<{ refdes: string; culprit: boolean }>(sql`
    SELECT k.refdes, cc.culprit FROM case_components cc JOIN components k ON k.id = cc.component_id
    WHERE cc.case_id = ${caseId} ORDER BY cc.culprit DESC, k.refdes`);
  return result.rows;
}

async function selectNetLinks(runner: Reader, caseId: number): Promise<{ id: number; name: string }[]> {
  const result = await runner.execute<{ id: number; name: string }>(sql`
    SELECT n.id, n.name FROM case_nets cn JOIN nets n ON n.id = cn.net_id WHERE cn.case_id = ${caseId} ORDER BY n.name`);
  return result.rows;
}

/** Rows of each kind still on a case, for what a merge left on the duplicate. */
async function linkedRowCounts(runner: Reader, caseId: number): Promise<CaseMergeCounts> {
  const result = await runner.execute<CaseMergeCounts>(sql`
    SELECT (SELECT count(*) FROM case_nets WHERE case_id = ${caseId})::int AS nets,
           (SELECT count(*) FROM case_components WHERE case_id = ${caseId})::int AS components,
           (SELECT count(*) FROM case_readings WHERE case_id = ${caseId})::int AS readings,
           (SELECT count(*) FROM case_attachments WHERE case_id = ${caseId})::int AS attachments,
           (SELECT count(*) FROM case_comments WHERE case_id = ${caseId})::int AS comments,
           (SELECT count(*) FROM case_confirmations WHERE case_id = ${caseId})::int AS confirmations,
           (SELECT count(*) FROM case_votes WHERE case_id = ${caseId})::int AS votes`);
  return result.rows[0]!;
}

const sortedIds = (rows: { id: number }[]) => rows.map((r) => r.id).sort((a, b) => a - b);

type Returned<Row> = { rows: Row[] };

/** The ids a merge (or its undo) moved per table, in a stable order; readings with their positions. */
function movedRows(moved: {
  nets: Returned<{ id: number }>;
  components: Returned<{ id: number }>;
  readings: Returned<{ id: number; position: number }>;
  attachments: Returned<{ id: number }>;
  comments: Returned<{ id: number }>;
  confirmations: Returned<{ id: number }>;
  votes: Returned<{ id: number }>;
}) {
  return {
    nets: sortedIds(moved.nets.rows),
    components: sortedIds(moved.components.rows),
    readings: moved.readings.rows.map((r) => ({ id: r.id, position: r.position })).sort((a, b) => a.position - b.position),
    attachments: sortedIds(moved.attachments.rows),
    comments: sortedIds(moved.comments.rows),
    confirmations: sortedIds(moved.confirmations.rows),
    votes: sortedIds(moved.votes.rows),
  };
}

/**
 * Tables holding at most one row per case and `key` (a net, a part, a person): a merge moves a row only
 * where the other case has none with the same key.
 */
type OnePerCase =
  | { table: 'case_nets'; key: 'net_id' }
  | { table: 'case_components'; key: 'component_id' }
  | { table: 'case_confirmations'; key: 'user_id' }
  | { table: 'case_votes'; key: 'user_id' };

/** Moves `from`'s rows to `into` where `into` has no row of the same key; `exceptKey` stays behind too. */
function moveWhereAbsent(tx: Tx, { table, key }: OnePerCase, fromId: number, intoId: number, exceptKey: number | null = null) {
  const [t, k] = [sql.identifier(table), sql.identifier(key)];
  return tx.execute<{ id: number }>(sql`
    UPDATE ${t} SET case_id = ${intoId}
    WHERE case_id = ${fromId} ${exceptKey === null ? sql`` : sql`AND ${k} <> ${exceptKey}`}
      AND ${k} NOT IN (SELECT ${k} FROM ${t} WHERE case_id = ${intoId})
    RETURNING id`);
}

/** Moves the listed rows still on `intoId` back to `fromId`, unless `fromId` holds one of the same key again. */
function moveBackWhereAbsent(tx: Tx, { table, key }: OnePerCase, ids: SQL, fromId: number, intoId: number) {
  const [t, k] = [sql.identifier(table), sql.identifier(key)];
  return tx.execute<{ id: number }>(sql`
    UPDATE ${t} m SET case_id = ${fromId}
    WHERE m.id = ANY(${ids}) AND m.case_id = ${intoId}
      AND NOT EXISTS (SELECT 1 FROM ${t} o WHERE o.case_id = ${fromId} AND o.${k} = m.${k})
    RETURNING m.id`);
}

/**
 * What a merge and its undo do to two cases, inside one transaction that holds both case rows locked.
 * Rows change case by UPDATE, so they keep their ids, authors and dates, and an undo can move back
 * exactly the rows the merge recorded.
 */
function mergeStore(tx: Tx) {
  return {
    findCase: (caseId: number) => selectCase(tx, caseId),

    async linksOf(caseId: number) {
      const [readings, nets, components] = [await selectReadings(tx, caseId), await selectNetLinks(tx, caseId), await selectComponents(tx, caseId)];
      return { readings, nets, components };
    },

    linkedRowCounts: (caseId: number) => linkedRowCounts(tx, caseId),

    /**
     * Moves the duplicate's rows to the kept case: links the kept case lacks, every reading (appended
     * after the kept case's last one), attachment and comment, and the votes and confirmations of people
     * with none on the kept case who did not write it. A part the duplicate names as culprit becomes the
     * kept case's culprit too.
     */
    async moveToKept(fromId: number, intoId: number, intoAuthorId: number): Promise<{ moved: CaseMergeMoves; culpritMarked: number[] }> {
      const marked = await tx.execute<{ id: number }>(sql`
        UPDATE case_components k SET culprit = true
        FROM case_components d
        WHERE d.case_id = ${fromId} AND d.culprit AND k.case_id = ${intoId} AND k.component_id = d.component_id AND NOT k.culprit
        RETURNING k.id`);
      const nets = await moveWhereAbsent(tx, { table: 'case_nets', key: 'net_id' }, fromId, intoId);
      const components = await moveWhereAbsent(tx, { table: 'case_components', key: 'component_id' }, fromId, intoId);
      const readings = await tx.execute<{ id: number; position: number }>(sql`
        WITH start AS (SELECT COALESCE(max(position) + 1, 0) AS at FROM case_readings WHERE case_id = ${intoId}),
             moving AS (SELECT id, position, (row_number() OVER (ORDER BY position, id) - 1)::int AS k
                        FROM case_readings WHERE case_id = ${fromId})
        UPDATE case_readings r SET case_id = ${intoId}, position = start.at + moving.k
        FROM moving, start WHERE r.id = moving.id
        RETURNING r.id, moving.position`);
      const attachments = await tx.execute<{ id: number }>(sql`
        UPDATE case_attachments SET case_id = ${intoId} WHERE case_id = ${fromId} RETURNING id`);
      const comments = await tx.execute<{ id: number }>(sql`
        UPDATE case_comments SET case_id = ${intoId} WHERE case_id = ${fromId} RETURNING id`);
      // one vote and one confirmation per person and case: the kept case's own stays, the other stays behind
      // the kept case's author takes no votes or confirmations on their own case
      const confirmations = await moveWhereAbsent(tx, { table: 'case_confirmations', key: 'user_id' }, fromId, intoId, intoAuthorId);
      const votes = await moveWhereAbsent(tx, { table: 'case_votes', key: 'user_id' }, fromId, intoId, intoAuthorId);
      return {
        moved: movedRows({ nets, components, readings, attachments, comments, confirmations, votes }),
        culpritMarked: sortedIds(marked.rows),
      };
    },

    /**
     * Moves the recorded rows that are still on the kept case back to the duplicate, readings to their
     * old positions, and clears the culprit marks the merge set. A row the kept case's author deleted or
     * replaced since is not there to move; one whose like the duplicate holds again is left where it is.
     */
    async moveBack(fromId: number, intoId: number, moves: CaseMergeMoves, culpritMarked: number[]): Promise<{ back: CaseMergeMoves; culpritCleared: number[] }> {
      const ids = (values: number[]) => sql`${arrayParam(values)}::int[]`;
      const nets = await moveBackWhereAbsent(tx, { table: 'case_nets', key: 'net_id' }, ids(moves.nets), fromId, intoId);
      const components = await moveBackWhereAbsent(tx, { table: 'case_components', key: 'component_id' }, ids(moves.components), fromId, intoId);
      const readings = await tx.execute<{ id: number; position: number }>(sql`
        UPDATE case_readings r SET case_id = ${fromId}, position = v.position
        FROM unnest(${ids(moves.readings.map((r) => r.id))}, ${ids(moves.readings.map((r) => r.position))}) AS v(id, position)
        WHERE r.id = v.id AND r.case_id = ${intoId}
          AND NOT EXISTS (SELECT 1 FROM case_readings o WHERE o.case_id = ${fromId} AND o.position = v.position)
        RETURNING r.id, r.position`);
      const attachments = await tx.execute<{ id: number }>(sql`
        UPDATE case_attachments SET case_id = ${fromId} WHERE id = ANY(${ids(moves.attachments)}) AND case_id = ${intoId} RETURNING id`);
      const comments = await tx.execute<{ id: number }>(sql`
        UPDATE case_comments SET case_id = ${fromId} WHERE id = ANY(${ids(moves.comments)}) AND case_id = ${intoId} RETURNING id`);
      const confirmations = await moveBackWhereAbsent(tx, { table: 'case_confirmations', key: 'user_id' }, ids(moves.confirmations), fromId, intoId);
      const votes = await moveBackWhereAbsent(tx, { table: 'case_votes', key: 'user_id' }, ids(moves.votes), fromId, intoId);
      const cleared = await tx.execute<{ id: number }>(sql`
        UPDATE case_components SET culprit = false
        WHERE id = ANY(${ids(culpritMarked)}) AND case_id = ${intoId} AND culprit
        RETURNING id`);
      return {
        back: movedRows({ nets, components, readings, attachments, comments, confirmations, votes }),
        culpritCleared: sortedIds(cleared.rows),
      };
    },

    async setMergedInto(caseId: number, intoId: number | null) {
      await tx.update(cases).set({ mergedIntoId: intoId, updatedAt: new Date() }).where(eq(cases.id, caseId));
    },

    /** Counts, rank and search text of a case after rows came or went. */
    async refresh(caseId: number, searchText: string, scorer: CaseScorer) {
      await rescore(tx, caseId, scorer);
      await tx.update(cases).set({ searchText, updatedAt: new Date() }).where(eq(cases.id, caseId));
    },

    async insertRevision(caseId: number, revision: RevisionRecord): Promise<number> {
      const [row] = await tx.insert(caseRevisions).values({ caseId, ...revision }).returning({ id: caseRevisions.id });
      return row!.id;
    },

    writeAudit: (record: AuditRecord) => writeAudit(tx, record),

    notify: (input: EnqueueInput) => enqueueNotification(tx, input),

    /** The audit row of the undo of a merge, once there is one. */
    async undoOf(mergeEntryId: number, fromId: number): Promise<number | null> {
      const result = await tx.execute<{ id: number }>(sql`
        SELECT id FROM audit_log
        WHERE target_type = 'case' AND target_id = ${String(fromId)} AND action = 'case.unmerge'
          AND details->>'undoes' = ${String(mergeEntryId)}
        ORDER BY id LIMIT 1`);
      return result.rows[0]?.id ?? null;
    },
  };
}

export type CaseMergeStore = ReturnType<typeof mergeStore>;

export function createCasebookRepository(db: Database) {
  async function resolveComponents(boardId: number, refdes: string[]) {
    if (refdes.length === 0) return [];
    const result = await db.execute<{ id: number; refdes: string }>(sql`
      SELECT id, refdes FROM components
      WHERE board_id = ${boardId} AND upper(refdes) = ANY(${arrayParam(refdes.map((r) => r.toUpperCase()))}::text[])`);
    return result.rows;
  }

  const commentSelect = sql`
    SELECT m.id, m.case_id, m.author_id, u.login AS author_login, u.name AS author_name, m.body,
           m.created_at, m.edited_at, m.deleted_at, m.hidden_at, m.hidden_reason
    FROM case_comments m JOIN users u ON u.id = m.author_id`;

  return {
    /** Nets of a board by printed name, alias or normalised key. */
    async resolveNets(boardId: number, names: string[], normalized: string[]) {
      if (names.length === 0) return [];
      const result = await db.execute<{ id: number; name: string; normalized_name: string; alias: string | null }>(sql`
        SELECT n.id, n.name, n.normalized_name, NULL::text AS alias FROM nets n
        WHERE n.board_id = ${boardId} AND (n.name = ANY(${arrayParam(names)}::text[]) OR n.normalized_name = ANY(${arrayParam(normalized)}::text[]))
        UNION ALL
        SELECT n.id, n.name, n.normalized_name, a.alias FROM net_aliases a JOIN nets n ON n.id = a.net_id
        WHERE a.board_id = ${boardId} AND a.alias = ANY(${arrayParam(names)}::text[])`);
      return result.rows;
    },

    /** Parts of a board by refdes, in any letter case. */
    resolveComponents,

    /** Which of the candidate words are net names, aliases or refdes of the board. */
    async boardNamesAmong(boardId: number, candidates: string[]) {
      if (candidates.length === 0) return { nets: new Set<string>(), refdes: new Set<string>() };
      const words = arrayParam(candidates);
      const result = await db.execute<{ kind: 'net' | 'component'; word: string }>(sql`
        SELECT 'net' AS kind, name AS word FROM nets WHERE board_id = ${boardId} AND name = ANY(${words}::text[])
        UNION
        SELECT 'net', alias FROM net_aliases WHERE board_id = ${boardId} AND alias = ANY(${words}::text[])
        UNION
        SELECT 'component', refdes FROM components WHERE board_id = ${boardId} AND refdes = ANY(${words}::text[])`);
      const nets = new Set<string>();
      const refdes = new Set<string>();
      for (const row of result.rows) (row.kind === 'net' ? nets : refdes).add(row.word);
      return { nets, refdes };
    },

    async findComponent(boardId: number, refdes: string) {
      const rows = await resolveComponents(boardId, [refdes]);
      return rows.find((r) => r.refdes === refdes) ?? rows[0] ?? null;
    },

    async insertCase(input: { boardId: number; authorId: number; fields: CaseFields; links: CaseLinks; revision: RevisionRecord }) {
      return db.transaction(async (tx) => {
        const now = new Date();
        const [row] = await tx
          .insert(cases)
          .values({
            boardId: input.boardId,
            authorId: input.authorId,
            ...input.fields,
            searchText: input.links.searchText,
            publishedAt: input.fields.status === 'published' ? now : null,
            createdAt: now,
            updatedAt: now,
          })
          .returning({ id: cases.id });
        const caseId = row!.id;
        await writeLinks(tx, caseId, input.links);
        await tx.insert(caseRevisions).values({ caseId, ...input.revision, createdAt: now });
        return caseId;
      });
    },

    async updateCase(caseId: number, change: { fields: CaseFields; links: CaseLinks | null; publish: boolean; revision: RevisionRecord }) {
      await db.transaction(async (tx) => {
        const now = new Date();
        await tx
          .update(cases)
          .set({
            ...change.fields,
            ...(change.links ? { searchText: change.links.searchText } : {}),
            ...(change.publish ? { publishedAt: now } : {}),
            updatedAt: now,
          })
          .where(eq(cases.id, caseId));
        if (change.links) await writeLinks(tx, caseId, change.links);
        await tx.insert(caseRevisions).values({ caseId, ...change.revision, createdAt: now });
      });
    },

    async deleteCase(caseId: number) {
      await db.delete(cases).where(eq(cases.id, caseId));
    },

    findCase: (caseId: number) => selectCase(db, caseId),

    /**
     * Where a case was merged into, for anyone to be sent there: null when it was not merged or is
     * hidden (whose readers the API sorts out, so a hidden case's existence is not given away),
     * undefined when there is no such case.
     */
    async mergedIntoOf(caseId: number): Promise<number | null | undefined> {
      const [row] = await db
        .select({ mergedIntoId: cases.mergedIntoId, hiddenAt: cases.hiddenAt })
        .from(cases)
        .where(eq(cases.id, caseId));
      if (!row) return undefined;
      return row.hiddenAt === null ? row.mergedIntoId : null;
    },

    /** Cases merged into this one, the latest merge first; hidden ones only when asked for. */
    async mergedFrom(caseId: number, includeHidden: boolean): Promise<{ id: number; title: string }[]> {
      const result = await db.execute<{ id: number; title: string }>(sql`
        SELECT c.id, c.title FROM cases c
        WHERE c.merged_into_id = ${caseId} ${includeHidden ? sql`` : sql`AND c.hidden_at IS NULL`}
        ORDER BY (SELECT max(a.id) FROM audit_log a
                  WHERE a.target_type = 'case' AND a.target_id = c.id::text AND a.action = 'case.merge') DESC NULLS LAST,
                 c.id DESC`);
      return result.rows;
    },

    /**
     * Runs `work` in one transaction holding the cases' rows locked (FOR UPDATE), taken in id order so
     * that two moderators merging the same pair both ways wait for each other instead of deadlocking.
     */
    async withCasesLocked<T>(caseIds: number[], work: (store: CaseMergeStore) => Promise<T>): Promise<T> {
      return db.transaction(async (tx) => {
        for (const caseId of [...new Set(caseIds)].sort((a, b) => a - b)) {
          await tx.execute(sql`SELECT 1 FROM cases WHERE id = ${caseId} FOR UPDATE`);
        }
        return work(mergeStore(tx));
      });
    },

    /** An audit row as a merge's undo reads it. */
    async auditEntry(entryId: number): Promise<{ action: string; targetType: string; targetId: string; details: Record<string, unknown> } | null> {
      const [row] = await db
        .select({ action: auditLog.action, targetType: auditLog.targetType, targetId: auditLog.targetId, details: auditLog.details })
        .from(auditLog)
        .where(eq(auditLog.id, entryId));
      return row ?? null;
    },

    async summaryOf(caseId: number, viewerId: number | null): Promise<CaseSummary | null> {
      const result = await db.execute<SummaryRow>(sql`SELECT ${summaryColumns(viewerId)} ${summaryFrom} WHERE c.id = ${caseId}`);
      const row = result.rows[0];
      return row ? toSummary(row) : null;
    },

    readingsOf: (caseId: number) => selectReadings(db, caseId),
    componentsOf: (caseId: number) => selectComponents(db, caseId),
    netLinksOf: (caseId: number) => selectNetLinks(db, caseId),

    async listCases(filter: CaseFilter, sort: CaseSort, page: { limit: number; offset: number }, viewerId: number | null) {
      const query = filter.q === undefined ? null : sql`websearch_to_tsquery('simple', ${filter.q}::text)`;
      const where = filterWhere(filter, query);
      const relevance = query ? sql`ts_rank_cd(c.search, ${query})::float8` : sql`NULL::float8`;
      const counted = await db.execute<{ total: number }>(sql`SELECT count(*)::int AS total FROM cases c WHERE ${where}`);
      const result = await db.execute<SummaryRow>(sql`
        SELECT ${summaryColumns(viewerId)}, ${relevance} AS relevance
        ${summaryFrom}
        WHERE ${where}
        ORDER BY ${orderings[sort]}
        LIMIT ${page.limit} OFFSET ${page.offset}`);
      return {
        total: counted.rows[0]?.total ?? 0,
        cases: result.rows.map((row) => ({ ...toSummary(row), relevance: row.relevance ?? null })),
      };
    },

    solvedAsCulprit: (componentId: number) => countSolvedAsCulprit(db, componentId),

    /**
     * Published cases of a board sharing nets or culprit parts with a draft, or whose text is like it:
     * full-text match on the draft's words (PostgreSQL's English stop words left out, since the
     * 'simple' configuration keeps them) ranked by ts_rank_cd, or pg_trgm similarity of the titles.
     */
    async similarCases(input: {
      boardId: number;
      netIds: number[];
      componentIds: number[];
      text: string;
      excludeId: number | null;
      limit: number;
      viewerId: number | null;
    }) {
      const text = input.text;
      const result = await db.execute<SummaryRow & { shared_nets: string[]; shared_culprits: string[]; text_score: number | null }>(sql`
        WITH words AS (
          SELECT w FROM unnest(tsvector_to_array(to_tsvector('simple', ${text}::text))) AS w
          WHERE tsvector_to_array(to_tsvector('english', w)) <> '{}'
        ),
        q AS (
          SELECT CASE WHEN count(*) = 0 THEN NULL
                      ELSE to_tsquery('simple', string_agg(quote_literal(w), ' | ')) END AS query
          FROM words
        ),
        matched AS (
          SELECT c.id,
            ARRAY(SELECT n.name FROM case_nets cn JOIN nets n ON n.id = cn.net_id
                  WHERE cn.case_id = c.id AND cn.net_id = ANY(${arrayParam(input.netIds)}::int[]) ORDER BY n.name) AS shared_nets,
            ARRAY(SELECT k.refdes FROM case_components cc JOIN components k ON k.id = cc.component_id
                  WHERE cc.case_id = c.id AND cc.culprit AND cc.component_id = ANY(${arrayParam(input.componentIds)}::int[])
                  ORDER BY k.refdes) AS shared_culprits,
            greatest(COALESCE(ts_rank_cd(c.search, q.query, 32), 0), similarity(c.title, ${text}::text))::float8 AS raw_text_score,
            (q.query IS NOT NULL AND c.search @@ q.query) OR similarity(c.title, ${text}::text) > 0.3 AS text_match
          FROM cases c CROSS JOIN q
          WHERE c.board_id = ${input.boardId} AND c.status = 'published' AND c.hidden_at IS NULL AND c.merged_into_id IS NULL
            ${input.excludeId === null ? sql`` : sql`AND c.id <> ${input.excludeId}`}
        )
        SELECT ${summaryColumns(input.viewerId)}, m.shared_nets, m.shared_culprits,
               CASE WHEN ${text}::text = '' THEN NULL WHEN m.text_match THEN m.raw_text_score ELSE 0 END AS text_score
        FROM matched m JOIN cases c ON c.id = m.id JOIN boards b ON b.id = c.board_id JOIN users u ON u.id = c.author_id
        WHERE cardinality(m.shared_nets) > 0 OR cardinality(m.shared_culprits) > 0 OR (${text}::text <> '' AND m.text_match)
        ORDER BY 3 * cardinality(m.shared_culprits) + cardinality(m.shared_nets)
                   + CASE WHEN m.text_match THEN 2 * m.raw_text_score ELSE 0 END DESC,
                 c.rank_score DESC, c.id DESC
        LIMIT ${input.limit}`);
      return result.rows.map((row) => ({
        ...toSummary(row),
        why: { nets: row.shared_nets, culprits: row.shared_culprits, text: row.text_score },
      }));
    },

    async revisionsOf(caseId: number): Promise<CaseRevision[]> {
      const rows = await db
        .select({ revision: caseRevisions, login: users.login, name: users.name })
        .from(caseRevisions)
        .innerJoin(users, eq(users.id, caseRevisions.editorId))
        .where(eq(caseRevisions.caseId, caseId))
        .orderBy(desc(caseRevisions.id));
      return rows.map(({ revision, login, name }) => ({
        id: revision.id,
        editor: { id: revision.editorId, login, name },
        createdAt: revision.createdAt.toISOString(),
        changed: revision.changed,
        summary: revision.summary,
        snapshot: revision.snapshot,
      }));
    },

    /** Votes and confirmations the author's published cases received, for their reputation. */
    async receivedBy(authorId: number) {
      const result = await db.execute<{ upvotes: number; downvotes: number; confirmations: number }>(sql`
        SELECT COALESCE(sum(up_votes), 0)::int AS upvotes, COALESCE(sum(down_votes), 0)::int AS downvotes,
               COALESCE(sum(confirmation_count), 0)::int AS confirmations
        FROM cases WHERE author_id = ${authorId} AND status = 'published'`);
      return result.rows[0] ?? { upvotes: 0, downvotes: 0, confirmations: 0 };
    },

    async setVote(caseId: number, userId: number, value: 1 | -1, scorer: CaseScorer) {
      await changeEvidence(db, caseId, scorer, (tx) =>
        tx
          .insert(caseVotes)
          .values({ caseId, userId, value })
          .onConflictDoUpdate({ target: [caseVotes.caseId, caseVotes.userId], set: { value, updatedAt: new Date() } }),
      );
    },

    async removeVote(caseId: number, userId: number, scorer: CaseScorer) {
      await changeEvidence(db, caseId, scorer, (tx) =>
        tx.delete(caseVotes).where(and(eq(caseVotes.caseId, caseId), eq(caseVotes.userId, userId))),
      );
    },

    /**
     * Adds or updates the user's confirmation; true when it is new. A new one queues `notify` in the
     * same transaction, so the author hears of exactly the confirmations that were committed.
     */
    async setConfirmation(caseId: number, userId: number, note: string, scorer: CaseScorer, notify: EnqueueInput | null = null): Promise<boolean> {
      return changeEvidence(db, caseId, scorer, async (tx) => {
        // xmax is 0 on a freshly inserted row and set on one ON CONFLICT updated
        const result = await tx.execute<{ inserted: boolean }>(sql`
          INSERT INTO case_confirmations (case_id, user_id, note) VALUES (${caseId}, ${userId}, ${note})
          ON CONFLICT (case_id, user_id) DO UPDATE SET note = EXCLUDED.note
          RETURNING (xmax = 0) AS inserted`);
        const inserted = result.rows[0]?.inserted ?? false;
        if (inserted && notify) await enqueueNotification(tx, notify);
        return inserted;
      });
    },

    async removeConfirmation(caseId: number, userId: number, scorer: CaseScorer) {
      await changeEvidence(db, caseId, scorer, (tx) =>
        tx.delete(caseConfirmations).where(and(eq(caseConfirmations.caseId, caseId), eq(caseConfirmations.userId, userId))),
      );
    },

    async confirmationsOf(caseId: number): Promise<CaseConfirmation[]> {
      const rows = await db
        .select({ confirmation: caseConfirmations, login: users.login, name: users.name })
        .from(caseConfirmations)
        .innerJoin(users, eq(users.id, caseConfirmations.userId))
        .where(eq(caseConfirmations.caseId, caseId))
        .orderBy(asc(caseConfirmations.createdAt), asc(caseConfirmations.id));
      return rows.map(({ confirmation, login, name }) => ({
        caseId,
        user: { id: confirmation.userId, login, name },
        note: confirmation.note,
        createdAt: confirmation.createdAt.toISOString(),
      }));
    },

    async commentsOf(caseId: number) {
      const result = await db.execute<CommentRow>(sql`${commentSelect} WHERE m.case_id = ${caseId} ORDER BY m.created_at, m.id LIMIT 1000`);
      return result.rows.map(toComment);
    },

    async commentById(commentId: number) {
      const result = await db.execute<CommentRow>(sql`${commentSelect} WHERE m.id = ${commentId}`);
      const row = result.rows[0];
      return row ? toComment(row) : null;
    },

    async findComment(commentId: number): Promise<CommentRecord | null> {
      const [row] = await db.select().from(caseComments).where(eq(caseComments.id, commentId));
      if (!row) return null;
      return {
        id: row.id,
        caseId: row.caseId,
        authorId: row.authorId,
        body: row.body,
        deleted: row.deletedAt !== null,
        hidden: row.hiddenAt !== null,
      };
    },

    /** `notify` builds the notification from the new comment's id; it commits with the comment. */
    async insertComment(caseId: number, authorId: number, body: string, notify: ((commentId: number) => EnqueueInput) | null = null): Promise<number> {
      return db.transaction(async (tx) => {
        await lockUnmergedCase(tx, caseId, 'key share');
        const [row] = await tx.insert(caseComments).values({ caseId, authorId, body }).returning({ id: caseComments.id });
        if (notify) await enqueueNotification(tx, notify(row!.id));
        return row!.id;
      });
    },

    /** With `audit`, the change commits together with its audit row (a moderator's change to another's comment). */
    async updateComment(commentId: number, body: string, audit: AuditRecord | null) {
      await db.transaction(async (tx) => {
        await tx.update(caseComments).set({ body, editedAt: new Date() }).where(eq(caseComments.id, commentId));
        if (audit) await writeAudit(tx, audit);
      });
    },

    async deleteComment(commentId: number, audit: AuditRecord | null) {
      await db.transaction(async (tx) => {
        await tx.update(caseComments).set({ deletedAt: new Date() }).where(eq(caseComments.id, commentId));
        if (audit) await writeAudit(tx, audit);
      });
    },

    /** A moderator's lock, hide or restore, committed together with its audit row. */
    async moderateCase(caseId: number, change: CaseModerationChange, audit: AuditRecord) {
      await db.transaction(async (tx) => {
        await tx.update(cases).set(change).where(eq(cases.id, caseId));
        await writeAudit(tx, audit);
      });
    },

    /** Hides (with the reason) or restores (null) a comment, with its audit row. */
    async moderateComment(commentId: number, hidden: { at: Date; reason: string } | null, audit: AuditRecord) {
      await db.transaction(async (tx) => {
        await tx
          .update(caseComments)
          .set(hidden ? { hiddenAt: hidden.at, hiddenReason: hidden.reason } : { hiddenAt: null, hiddenReason: '' })
          .where(eq(caseComments.id, commentId));
        await writeAudit(tx, audit);
      });
    },

    /**
     * Records a member's flag and tells the moderators, in one transaction. Null when the member already
     * has an open flag on the item (the partial unique index decides, so two quick clicks make one flag).
     */
    async insertFlag(
      flag: { contentType: 'case' | 'comment'; contentId: number; flaggerId: number; reason: string },
      notify: { kind: string; payload: unknown },
    ): Promise<number | null> {
      return db.transaction(async (tx) => {
        const result = await tx.execute<{ id: number }>(sql`
          INSERT INTO case_flags (content_type, content_id, flagger_id, reason)
          VALUES (${flag.contentType}, ${flag.contentId}, ${flag.flaggerId}, ${flag.reason})
          ON CONFLICT (content_type, content_id, flagger_id) WHERE status = 'open' DO NOTHING
          RETURNING id`);
        const id = result.rows[0]?.id;
        if (id === undefined) return null;
        await enqueueModeratorNotification(tx, { ...notify, exceptUserId: flag.flaggerId });
        return id;
      });
    },

    async flagById(flagId: number): Promise<CaseFlag | null> {
      const result = await db.execute<FlagRow>(sql`${flagSelect} WHERE f.id = ${flagId}`);
      const row = result.rows[0];
      return row ? toFlag(row) : null;
    },

    async listFlags(status: 'open' | 'resolved'): Promise<CaseFlag[]> {
      const result = await db.execute<FlagRow>(sql`${flagSelect} WHERE f.status = ${status} ORDER BY f.created_at, f.id LIMIT 500`);
      return result.rows.map(toFlag);
    },

    /** Resolves an open flag with its audit row; false when it was not open (any more). */
    async resolveFlag(flagId: number, resolverId: number, resolution: string, audit: AuditRecord): Promise<boolean> {
      return db.transaction(async (tx) => {
        const result = await tx.execute<{ id: number }>(sql`
          UPDATE case_flags SET status = 'resolved', resolver_id = ${resolverId}, resolution = ${resolution}, resolved_at = now()
          WHERE id = ${flagId} AND status = 'open' RETURNING id`);
        if (result.rows.length === 0) return false;
        await writeAudit(tx, audit);
        return true;
      });
    },
  };
}

export type CasebookRepository = ReturnType<typeof createCasebookRepository>;
