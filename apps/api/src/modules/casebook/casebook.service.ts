// The casebook's rules: who may see, edit, vote on and comment on a case; readings and links checked
// against the board; a revision with each change; votes ranked by the Wilson bound.
import { normalizeNetName } from '@railyard/board-analysis';
import {
  roleAtLeast,
  type CaseComment,
  type CaseConfirmation,
  type CaseCreate,
  type CaseDetail,
  type CaseFlag,
  type CaseListQuery,
  type CaseListResponse,
  type CaseMergeInput,
  type CaseMergeSummary,
  type CasePageQuery,
  type CaseRevision,
  type CaseRevisionSnapshot,
  type CaseScore,
  type CaseSort,
  type CaseUpdate,
  type SessionUser,
  type SimilarCase,
  type SimilarCasesQuery,
} from '@railyard/shared';
import { caseEvidence, caseRankScore, reputation } from '@railyard/vote-ranking';
import { AppError } from '../../lib/app-error';
import type { BoardsRepository } from '../boards/boards.repository';
import type {
  CaseFields,
  CaseLinks,
  CaseMergeStore,
  CaseModerationChange,
  CaseRecord,
  CaseScorer,
  CasebookRepository,
} from './casebook.repository';
import { nameCandidates, renderCaseMarkdown, type BoardNames } from './case-markdown';
import { caseMergeRecordSchema, countMoves, rowsLeftBehind, type CaseMergeRecord } from './case-merge-record';

export type CaseModerationAction = 'lock' | 'unlock' | 'hide' | 'restore';

/** Who is asking: null when signed out. */
export type Viewer = Pick<SessionUser, 'id' | 'role'> | null;

const scorer: CaseScorer = (votes, confirmedBy) => {
  const evidence = caseEvidence(votes, confirmedBy);
  return { ups: evidence.ups, downs: evidence.downs, confirmations: evidence.confirmations, rankScore: caseRankScore(evidence) };
};

/**
 * After rows moved between a duplicate and the case it was merged into (either way): both cases' counts,
 * rank and search text from what each now holds; the kept case's links, for its revision.
 */
async function refreshBoth(store: CaseMergeStore, fromId: number, intoId: number) {
  const fromLinks = await store.linksOf(fromId);
  const intoLinks = await store.linksOf(intoId);
  await store.refresh(fromId, searchTextOf(fromLinks.nets, fromLinks.components), scorer);
  await store.refresh(intoId, searchTextOf(intoLinks.nets, intoLinks.components), scorer);
  return intoLinks;
}

/** The fields and links a revision records (a merge's revision carries the duplicate's besides). */
type SnapshotField = Exclude<keyof CaseRevisionSnapshot, 'merged'>;

/** Field names as people read them, in the order revisions list them. */
const fieldLabels: Record<SnapshotField, string> = {
  status: 'status',
  title: 'title',
  symptom: 'symptom',
  rootCause: 'root cause',
  fixSteps: 'fix steps',
  body: 'write-up',
  outcome: 'outcome',
  minutesSpent: 'time spent',
  readings: 'readings',
  nets: 'nets',
  components: 'parts',
};
const snapshotKeys = Object.keys(fieldLabels) as SnapshotField[];

function sentenceList(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`;
}

/** Names a full-text search should find a case by, beside its text: its nets and parts. */
function searchTextOf(nets: { name: string }[], components: { refdes: string }[]): string {
  return [...nets.map((n) => n.name), ...components.map((c) => c.refdes)].join(' ');
}

function changedFields(before: CaseRevisionSnapshot, after: CaseRevisionSnapshot): SnapshotField[] {
  return snapshotKeys.filter((key) => JSON.stringify(before[key]) !== JSON.stringify(after[key]));
}

function invalid(issues: { field: string; message: string }[]): AppError {
  return new AppError(400, 'invalid_request', 'The request is not valid', { issues });
}

/** The name a notification shows for the person who acted (names are limited to 100 characters there). */
const displayName = (user: Pick<SessionUser, 'login' | 'name'>) => (user.name || user.login).slice(0, 100);

const forbidden = (message: string) => new AppError(403, 'forbidden', message);
const caseNotFound = (id: number) => AppError.notFound(`Case ${id}`);

export function createCasebookService(deps: { boards: BoardsRepository; cases: CasebookRepository }) {
  const { boards, cases } = deps;

  async function requireBoard(slug: string) {
    const board = await boards.findBoard(slug);
    if (!board) throw AppError.notFound(`Board "${slug}"`);
    return board;
  }

  const isModerator = (viewer: Viewer) => viewer !== null && roleAtLeast(viewer.role, 'moderator');

  /**
   * A case the viewer may see: drafts only to their author, hidden cases to their author and moderators;
   * anything else is "not found", so a hidden case's existence is not given away.
   */
  async function visibleCase(id: number, viewer: Viewer): Promise<CaseRecord> {
    const record = await cases.findCase(id);
    if (!record || (record.status === 'draft' && record.authorId !== viewer?.id)) throw caseNotFound(id);
    if (record.hiddenAt !== null && record.authorId !== viewer?.id && !isModerator(viewer)) throw caseNotFound(id);
    return record;
  }

  /** A merged-away case lives on in the case it was merged into: every change goes there instead. */
  function refuseMerged(record: CaseRecord) {
    if (record.mergedIntoId !== null) {
      throw new AppError(409, 'case_merged', `Case ${record.id} was merged into case ${record.mergedIntoId}: make changes there`, {
        mergedIntoId: record.mergedIntoId,
      });
    }
  }

  /** A case the viewer may see and that takes changes (it was not merged away). */
  async function writableCase(id: number, viewer: Viewer): Promise<CaseRecord> {
    const record = await visibleCase(id, viewer);
    refuseMerged(record);
    return record;
  }

  /** Why a moderator cannot fold `from` into `into`, if they cannot. */
  function refuseMerge(from: CaseRecord, into: CaseRecord) {
    if (from.mergedIntoId !== null) {
      throw new AppError(409, 'case_merged', `Case ${from.id} was already merged into case ${from.mergedIntoId}`, {
        mergedIntoId: from.mergedIntoId,
      });
    }
    if (into.mergedIntoId !== null) {
      throw new AppError(
        409,
        'case_merged',
        `Case ${into.id} was itself merged into case ${into.mergedIntoId}: merge into that case instead`,
        { field: 'intoCaseId', mergedIntoId: into.mergedIntoId },
      );
    }
    if (from.boardId !== into.boardId) {
      throw new AppError(
        409,
        'different_boards',
        `Case ${from.id} is on board "${from.boardSlug}" and case ${into.id} on board "${into.boardSlug}": only cases of one board can be merged`,
        { field: 'intoCaseId', boards: [from.boardSlug, into.boardSlug] },
      );
    }
    // a draft is its author's own until published: nobody else folds it anywhere or anything into it
    for (const [record, field] of [[from, 'id'], [into, 'intoCaseId']] as const) {
      if (record.status === 'draft') {
        throw new AppError(409, 'not_published', `Case ${record.id} is a draft: only published cases can be merged`, { field });
      }
    }
  }

  /** A locked case keeps what it has; nothing new is added to it or changed in it. */
  function refuseLocked(record: CaseRecord, what: string) {
    if (record.lockedAt !== null) {
      throw new AppError(409, 'case_locked', `Case ${record.id} is locked by a moderator: it takes no ${what}`);
    }
  }

  /** A published case someone other than its author acts on: votes and confirmations. */
  async function othersPublishedCase(id: number, viewer: SessionUser, what: 'vote' | 'confirmation'): Promise<CaseRecord> {
    const record = await writableCase(id, viewer);
    if (record.authorId === viewer.id) {
      throw new AppError(403, 'own_case', what === 'vote' ? 'You cannot vote on your own case' : 'You cannot confirm your own case');
    }
    if (record.status !== 'published') {
      throw new AppError(409, 'not_published', what === 'vote' ? 'Only published cases take votes' : 'Only published cases can be confirmed');
    }
    refuseLocked(record, what === 'vote' ? 'new votes' : 'new confirmations');
    return record;
  }

  async function boardNamesFor(boardId: number, slug: string, ...texts: string[]): Promise<BoardNames> {
    // a bounded lookup, whatever the length of the text
    const candidates = nameCandidates(...texts).slice(0, 5000);
    const found = await cases.boardNamesAmong(boardId, candidates);
    return { slug, nets: found.nets, refdes: found.refdes };
  }

  /** Readings, nets and parts checked against the board, every unknown name reported with its field. */
  async function resolveLinks(
    boardId: number,
    slug: string,
    input: Pick<CaseCreate, 'readings' | 'nets' | 'components'>,
  ): Promise<CaseLinks> {
    const issues: { field: string; message: string }[] = [];
    const netNames = [...new Set([...input.nets, ...input.readings.map((r) => r.net)])];
    const netRows = await cases.resolveNets(boardId, netNames, netNames.map(normalizeNetName));
    const findNet = (name: string) => {
      const exact = netRows.find((r) => r.alias === null && r.name === name) ?? netRows.find((r) => r.alias === name);
      if (exact) return { id: exact.id, name: exact.name };
      const byKey = new Map(netRows.filter((r) => r.normalized_name === normalizeNetName(name)).map((r) => [r.id, r]));
      // a separator-insensitive match only counts when it names one net
      const only = byKey.size === 1 ? [...byKey.values()][0]! : null;
      return only ? { id: only.id, name: only.name } : null;
    };
    const linked = new Map<number, { id: number; name: string }>();
    input.nets.forEach((name, index) => {
      const net = findNet(name);
      if (net) linked.set(net.id, net);
      else issues.push({ field: `nets.${index}`, message: `${name} is not a net of board "${slug}"` });
    });
    const readings = input.readings.map((reading, index) => {
      const net = findNet(reading.net);
      if (!net) {
        issues.push({ field: `readings.${index}.net`, message: `${reading.net} is not a net of board "${slug}"` });
        return reading;
      }
      // a net that was measured is a net the case is about
      linked.set(net.id, net);
      return { ...reading, net: net.name };
    });

    const partRows = await cases.resolveComponents(boardId, input.components.map((c) => c.refdes));
    const parts = new Map<number, { id: number; refdes: string; culprit: boolean }>();
    input.components.forEach((component, index) => {
      const row =
        partRows.find((r) => r.refdes === component.refdes) ??
        partRows.find((r) => r.refdes.toUpperCase() === component.refdes.toUpperCase());
      if (!row) {
        issues.push({ field: `components.${index}.refdes`, message: `${component.refdes} is not a part of board "${slug}"` });
      } else if (parts.has(row.id)) {
        issues.push({ field: `components.${index}.refdes`, message: `part ${row.refdes} is listed twice` });
      } else {
        parts.set(row.id, { id: row.id, refdes: row.refdes, culprit: component.culprit });
      }
    });
    if (issues.length > 0) throw invalid(issues);

    const nets = [...linked.values()].sort((a, b) => a.name.localeCompare(b.name));
    const components = [...parts.values()].sort((a, b) => Number(b.culprit) - Number(a.culprit) || a.refdes.localeCompare(b.refdes));
    return {
      readings,
      nets,
      components,
      searchText: searchTextOf(nets, components),
    };
  }

  interface LinkNames {
    readings: CaseLinks['readings'];
    nets: { name: string }[];
    components: { refdes: string; culprit: boolean }[];
  }

  function snapshotOf(fields: CaseFields, links: LinkNames): CaseRevisionSnapshot {
    return {
      ...fields,
      readings: links.readings.map((r) => ({ net: r.net, mode: r.mode, measured: r.measured, knownGood: r.knownGood })),
      nets: links.nets.map((n) => n.name),
      components: links.components.map((c) => ({ refdes: c.refdes, culprit: c.culprit })),
    };
  }

  async function currentLinks(record: CaseRecord): Promise<LinkNames> {
    const [readings, nets, components] = await Promise.all([
      cases.readingsOf(record.id),
      cases.netLinksOf(record.id),
      cases.componentsOf(record.id),
    ]);
    return {
      readings: readings.map((r) => ({ net: r.net, mode: r.mode, measured: r.measured, knownGood: r.knownGood })),
      nets,
      components,
    };
  }

  const fieldsOf = (record: CaseRecord): CaseFields => ({
    status: record.status,
    title: record.title,
    symptom: record.symptom,
    rootCause: record.rootCause,
    fixSteps: record.fixSteps,
    body: record.body,
    outcome: record.outcome,
    minutesSpent: record.minutesSpent,
  });

  async function detail(record: CaseRecord, viewer: Viewer): Promise<CaseDetail> {
    const [summary, readings, components, received, names, mergedFrom] = await Promise.all([
      cases.summaryOf(record.id, viewer?.id ?? null),
      cases.readingsOf(record.id),
      cases.componentsOf(record.id),
      cases.receivedBy(record.authorId),
      boardNamesFor(record.boardId, record.boardSlug, record.rootCause, record.fixSteps, record.body),
      // a hidden case's title is not given away through the case it was merged into
      cases.mergedFrom(record.id, isModerator(viewer)),
    ]);
    if (!summary) throw caseNotFound(record.id);
    return {
      ...summary,
      author: { ...summary.author, reputation: reputation(received) },
      rootCause: record.rootCause,
      fixSteps: record.fixSteps,
      body: record.body,
      html: {
        rootCause: renderCaseMarkdown(record.rootCause, names),
        fixSteps: renderCaseMarkdown(record.fixSteps, names),
        body: renderCaseMarkdown(record.body, names),
      },
      readings,
      components,
      moderation: {
        lockedAt: record.lockedAt?.toISOString() ?? null,
        hiddenAt: record.hiddenAt?.toISOString() ?? null,
        hiddenReason: record.hiddenReason,
      },
      mergedFrom,
    };
  }

  async function scoreOf(id: number, viewer: Viewer): Promise<CaseScore> {
    const summary = await cases.summaryOf(id, viewer?.id ?? null);
    if (!summary) throw caseNotFound(id);
    return summary.score;
  }

  async function renderComments(record: CaseRecord, comments: Omit<CaseComment, 'html'>[]): Promise<CaseComment[]> {
    const names = await boardNamesFor(record.boardId, record.boardSlug, ...comments.map((c) => c.body));
    return comments.map((c) => ({ ...c, html: renderCaseMarkdown(c.body, names) }));
  }

  /** The comment and its case, when the viewer may change it: its author, or a moderator for anyone's. */
  async function changeableComment(commentId: number, viewer: SessionUser, action: string) {
    const comment = await cases.findComment(commentId);
    if (!comment || comment.deleted) throw AppError.notFound(`Comment ${commentId}`);
    const record = await writableCase(comment.caseId, viewer);
    const own = comment.authorId === viewer.id;
    if (!own && !isModerator(viewer)) throw forbidden(`You can only ${action} your own comments`);
    if (!isModerator(viewer)) refuseLocked(record, 'edits');
    return { comment, record, own };
  }

  /** A comment a moderator acts on, with its case; hidden and locked ones included. */
  async function moderatedComment(commentId: number, moderator: SessionUser) {
    const comment = await cases.findComment(commentId);
    if (!comment || comment.deleted) throw AppError.notFound(`Comment ${commentId}`);
    return { comment, record: await visibleCase(comment.caseId, moderator) };
  }

  function paging(query: CasePageQuery) {
    return { limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
  }

  return {
    async create(slug: string, input: CaseCreate, author: SessionUser): Promise<CaseDetail> {
      const board = await requireBoard(slug);
      const links = await resolveLinks(board.id, board.slug, input);
      const { readings: _r, nets: _n, components: _c, ...fields } = input;
      const id = await cases.insertCase({
        boardId: board.id,
        authorId: author.id,
        fields,
        links,
        revision: {
          editorId: author.id,
          snapshot: snapshotOf(fields, links),
          changed: [...snapshotKeys],
          summary: fields.status === 'published' ? 'written and published' : 'written as a draft',
        },
      });
      return detail((await cases.findCase(id))!, author);
    },

    /** A case, or the case it was merged into (for the reader to be sent there). */
    async get(id: number, viewer: Viewer): Promise<{ case: CaseDetail } | { mergedInto: { id: number } }> {
      const record = await visibleCase(id, viewer);
      if (record.mergedIntoId !== null) return { mergedInto: { id: record.mergedIntoId } };
      return { case: await detail(record, viewer) };
    },

    /**
     * Where an old link to a case should lead: the end of its chain of merges (A into B, B later into C),
     * followed a few steps at most; null when the case was not merged or does not exist.
     */
    async mergeDestination(id: number): Promise<number | null> {
      let destination: number | null = null;
      for (let step = 0, at = id; step < 5; step++) {
        const next = await cases.mergedIntoOf(at);
        if (next === null || next === undefined) break;
        destination = next;
        at = next;
      }
      return destination;
    },

    async update(id: number, change: CaseUpdate, editor: SessionUser): Promise<CaseDetail> {
      const record = await writableCase(id, editor);
      if (record.authorId !== editor.id) throw forbidden('Only the author can edit a case');
      refuseLocked(record, 'edits');
      if (record.status === 'published' && change.status === 'draft') {
        throw new AppError(409, 'already_published', 'A published case cannot go back to draft', { field: 'status' });
      }
      const before = await currentLinks(record);
      const linksChanged = change.readings !== undefined || change.nets !== undefined || change.components !== undefined;
      const links = linksChanged
        ? await resolveLinks(record.boardId, record.boardSlug, {
            readings: change.readings ?? before.readings,
            // a net stays linked until the author replaces the list, even when it came in with a reading
            nets: change.nets ?? before.nets.map((n) => n.name),
            components: change.components ?? before.components,
          })
        : null;
      const { readings: _r, nets: _n, components: _c, ...fieldChange } = change;
      const fields: CaseFields = { ...fieldsOf(record), ...fieldChange };
      const newSnapshot = snapshotOf(fields, links ?? before);
      const changed = changedFields(snapshotOf(fieldsOf(record), before), newSnapshot);
      if (changed.length === 0) return detail(record, editor);
      const publish = record.status === 'draft' && fields.status === 'published';
      const edits = changed.filter((key) => key !== 'status').map((key) => fieldLabels[key]);
      const summary = [publish ? 'published' : '', edits.length > 0 ? `changed ${sentenceList(edits)}` : '']
        .filter((part) => part !== '')
        .join('; ');
      await cases.updateCase(id, {
        fields,
        links,
        publish,
        revision: { editorId: editor.id, snapshot: newSnapshot, changed, summary },
      });
      return detail((await cases.findCase(id))!, editor);
    },

    async remove(id: number, user: SessionUser): Promise<void> {
      const record = await writableCase(id, user);
      if (record.authorId !== user.id) throw forbidden('Only the author can delete a case');
      if (record.status === 'published') {
        throw new AppError(409, 'already_published', 'A published case cannot be deleted: others may have voted on it, confirmed it or commented');
      }
      await cases.deleteCase(id);
    },

    async revisions(id: number, viewer: Viewer): Promise<{ caseId: number; revisions: CaseRevision[] }> {
      await visibleCase(id, viewer);
      return { caseId: id, revisions: await cases.revisionsOf(id) };
    },

    async list(slug: string, query: CaseListQuery, viewer: Viewer): Promise<CaseListResponse> {
      const board = await requireBoard(slug);
      const sort: CaseSort = query.sort ?? (query.q ? 'relevance' : 'rank');
      if (sort === 'relevance' && !query.q) throw invalid([{ field: 'sort', message: 'sort by relevance needs a search text (q)' }]);
      if (query.status === 'draft' && !viewer) throw new AppError(401, 'sign_in_required', 'Sign in to see your drafts');
      let netId: number | undefined;
      if (query.net !== undefined) {
        const net = await boards.findNet(board.id, query.net);
        if (!net) throw AppError.notFound(`Net "${query.net}" on board "${slug}"`);
        netId = net.id;
      }
      let componentId: number | undefined;
      if (query.component !== undefined) {
        const component = await cases.findComponent(board.id, query.component);
        if (!component) throw AppError.notFound(`Component "${query.component}" on board "${slug}"`);
        componentId = component.id;
      }
      const { total, cases: found } = await cases.listCases(
        {
          boardId: board.id,
          status: query.status,
          authorId: query.status === 'draft' ? viewer!.id : undefined,
          netId,
          componentId,
          outcome: query.outcome,
          q: query.q,
        },
        sort,
        paging(query),
        viewer?.id ?? null,
      );
      return { board: board.slug, page: query.page, pageSize: query.pageSize, total, sort, cases: found };
    },

    async listForNet(slug: string, netName: string, page: CasePageQuery, viewer: Viewer) {
      const board = await requireBoard(slug);
      const net = await boards.findNet(board.id, netName);
      if (!net) throw AppError.notFound(`Net "${netName}" on board "${slug}"`);
      const found = await cases.listCases({ boardId: board.id, status: 'published', netId: net.id }, 'rank', paging(page), viewer?.id ?? null);
      return { board: board.slug, net: net.name, page: page.page, pageSize: page.pageSize, ...found };
    },

    async listForComponent(slug: string, refdes: string, page: CasePageQuery, viewer: Viewer) {
      const board = await requireBoard(slug);
      const component = await cases.findComponent(board.id, refdes);
      if (!component) throw AppError.notFound(`Component "${refdes}" on board "${slug}"`);
      const [found, solvedAsCulprit] = await Promise.all([
        cases.listCases({ boardId: board.id, status: 'published', componentId: component.id }, 'rank', paging(page), viewer?.id ?? null),
        cases.solvedAsCulprit(component.id),
      ]);
      return { board: board.slug, refdes: component.refdes, solvedAsCulprit, page: page.page, pageSize: page.pageSize, ...found };
    },

    async similar(slug: string, query: SimilarCasesQuery, viewer: Viewer): Promise<{ board: string; cases: SimilarCase[] }> {
      const board = await requireBoard(slug);
      const names = query.nets ?? [];
      // unknown names are simply not matched: the form asks while the technician is still typing
      const netRows = await cases.resolveNets(board.id, names, names.map(normalizeNetName));
      const partRows = await cases.resolveComponents(board.id, query.components ?? []);
      const found = await cases.similarCases({
        boardId: board.id,
        netIds: [...new Set(netRows.map((r) => r.id))],
        componentIds: partRows.map((r) => r.id),
        text: query.text ?? '',
        excludeId: query.exclude ?? null,
        limit: query.limit,
        viewerId: viewer?.id ?? null,
      });
      return { board: board.slug, cases: found };
    },

    async vote(id: number, value: 1 | -1, user: SessionUser): Promise<{ score: CaseScore }> {
      await othersPublishedCase(id, user, 'vote');
      await cases.setVote(id, user.id, value, scorer);
      return { score: await scoreOf(id, user) };
    },

    async removeVote(id: number, user: SessionUser): Promise<{ score: CaseScore }> {
      await othersPublishedCase(id, user, 'vote');
      await cases.removeVote(id, user.id, scorer);
      return { score: await scoreOf(id, user) };
    },

    async confirm(id: number, note: string, user: SessionUser): Promise<{ created: boolean; score: CaseScore }> {
      const record = await othersPublishedCase(id, user, 'confirmation');
      const created = await cases.setConfirmation(id, user.id, note, scorer, {
        userId: record.authorId,
        kind: 'case_confirmed',
        payload: { caseId: id, caseTitle: record.title, confirmedByName: displayName(user), ...(note ? { note } : {}) },
      });
      return { created, score: await scoreOf(id, user) };
    },

    async removeConfirmation(id: number, user: SessionUser): Promise<{ score: CaseScore }> {
      await othersPublishedCase(id, user, 'confirmation');
      await cases.removeConfirmation(id, user.id, scorer);
      return { score: await scoreOf(id, user) };
    },

    async confirmations(id: number, viewer: Viewer): Promise<{ caseId: number; confirmations: CaseConfirmation[] }> {
      await visibleCase(id, viewer);
      return { caseId: id, confirmations: await cases.confirmationsOf(id) };
    },

    async comments(id: number, viewer: Viewer): Promise<{ caseId: number; comments: CaseComment[] }> {
      const record = await visibleCase(id, viewer);
      // a hidden comment reaches moderators and its own author only
      const shown = (await cases.commentsOf(id)).filter((c) => !c.hidden || isModerator(viewer) || c.author.id === viewer?.id);
      return { caseId: id, comments: await renderComments(record, shown) };
    },

    async addComment(id: number, body: string, user: SessionUser): Promise<CaseComment> {
      const record = await writableCase(id, user);
      if (record.status !== 'published') throw new AppError(409, 'not_published', 'Only published cases take comments');
      refuseLocked(record, 'new comments');
      // nobody is told about their own comment
      const notify =
        record.authorId === user.id
          ? null
          : (newId: number) => ({
              userId: record.authorId,
              kind: 'case_commented',
              payload: { caseId: id, caseTitle: record.title, commentId: newId, commenterName: displayName(user), excerpt: body.slice(0, 500) },
            });
      const commentId = await cases.insertComment(id, user.id, body, notify);
      const [comment] = await renderComments(record, [(await cases.commentById(commentId))!]);
      return comment!;
    },

    async editComment(commentId: number, body: string, reason: string, user: SessionUser): Promise<CaseComment> {
      const { comment, record, own } = await changeableComment(commentId, user, 'edit');
      await cases.updateComment(
        commentId,
        body,
        own
          ? null
          : {
              actorId: user.id,
              action: 'comment.edit',
              targetType: 'comment',
              targetId: String(commentId),
              reason,
              details: { case: record.id, author: comment.authorId, before: comment.body, after: body },
            },
      );
      const [updated] = await renderComments(record, [(await cases.commentById(commentId))!]);
      return updated!;
    },

    async deleteComment(commentId: number, reason: string, user: SessionUser): Promise<void> {
      const { comment, record, own } = await changeableComment(commentId, user, 'delete');
      await cases.deleteComment(
        commentId,
        own
          ? null
          : {
              actorId: user.id,
              action: 'comment.delete',
              targetType: 'comment',
              targetId: String(commentId),
              reason,
              details: { case: record.id, author: comment.authorId, body: comment.body },
            },
      );
    },

    /** lock, unlock, hide, restore: a moderator's change of a case's state, each with its audit row. */
    async moderateCase(id: number, action: CaseModerationAction, reason: string, moderator: SessionUser): Promise<CaseDetail> {
      const record = await writableCase(id, moderator);
      const refuse = (code: string, message: string) => new AppError(409, code, message);
      let change: CaseModerationChange;
      switch (action) {
        case 'lock':
          if (record.lockedAt !== null) throw refuse('already_locked', `Case ${id} is already locked`);
          change = { lockedAt: new Date() };
          break;
        case 'unlock':
          if (record.lockedAt === null) throw refuse('not_locked', `Case ${id} is not locked`);
          change = { lockedAt: null };
          break;
        case 'hide':
          if (record.hiddenAt !== null) throw refuse('already_hidden', `Case ${id} is already hidden`);
          change = { hiddenAt: new Date(), hiddenReason: reason };
          break;
        case 'restore':
          if (record.hiddenAt === null) throw refuse('not_hidden', `Case ${id} is not hidden`);
          change = { hiddenAt: null, hiddenReason: '' };
          break;
      }
      await cases.moderateCase(id, change, {
        actorId: moderator.id,
        action: `case.${action}`,
        targetType: 'case',
        targetId: String(id),
        reason,
        details: { author: record.authorId, board: record.boardSlug },
      });
      return detail((await cases.findCase(id))!, moderator);
    },

    /**
     * Folds a duplicate case into the case it repeats, in one transaction holding both case rows. Rows
     * move by changing their case, nothing is deleted: what the kept case already has (a link, a
     * person's vote or confirmation) stays on the duplicate. The duplicate's text is kept in a revision
     * of the kept case, and the audit row lists every moved row so that an admin can undo the merge.
     */
    async merge(fromId: number, input: CaseMergeInput, moderator: SessionUser): Promise<{ case: CaseDetail; merge: CaseMergeSummary }> {
      const intoId = input.intoCaseId;
      if (fromId === intoId) throw invalid([{ field: 'intoCaseId', message: `case ${fromId} cannot be merged into itself` }]);
      const summary = await cases.withCasesLocked([fromId, intoId], async (store): Promise<CaseMergeSummary> => {
        const from = await store.findCase(fromId);
        if (!from) throw caseNotFound(fromId);
        const into = await store.findCase(intoId);
        if (!into) throw new AppError(404, 'not_found', `Case ${intoId} was not found`, { field: 'intoCaseId' });
        refuseMerge(from, into);

        const fromBefore = snapshotOf(fieldsOf(from), await store.linksOf(fromId));
        const intoBefore = snapshotOf(fieldsOf(into), await store.linksOf(intoId));
        const { moved, culpritMarked } = await store.moveToKept(fromId, intoId, into.authorId);
        const keptOnDuplicate = await store.linkedRowCounts(fromId);
        await store.setMergedInto(fromId, intoId);
        const intoAfter = snapshotOf(fieldsOf(into), await refreshBoth(store, fromId, intoId));
        const revisionId = await store.insertRevision(intoId, {
          editorId: moderator.id,
          snapshot: { ...intoAfter, merged: { caseId: fromId, snapshot: fromBefore } },
          changed: changedFields(intoBefore, intoAfter),
          summary: `merged case #${fromId} “${from.title}” into this case`,
        });
        const record: CaseMergeRecord = { intoCaseId: intoId, boardId: into.boardId, moved, culpritMarked, keptOnDuplicate, revisionId };
        const auditId = await store.writeAudit({
          actorId: moderator.id,
          action: 'case.merge',
          targetType: 'case',
          targetId: String(fromId),
          reason: input.reason,
          details: { ...record, board: into.boardSlug, fromTitle: from.title, intoTitle: into.title },
        });
        if (from.authorId !== moderator.id) {
          await store.notify({
            userId: from.authorId,
            kind: 'case_merged',
            payload: {
              caseId: fromId,
              caseTitle: from.title,
              intoCaseId: intoId,
              intoCaseTitle: into.title,
              mergedByName: displayName(moderator),
              reason: input.reason,
            },
          });
        }
        return { auditId, fromCaseId: fromId, intoCaseId: intoId, moved: countMoves(moved), keptOnDuplicate };
      });
      return { case: await detail((await cases.findCase(intoId))!, moderator), merge: summary };
    },

    /**
     * An admin takes a merge back through its audit row: the recorded rows still on the kept case go
     * home (readings to their old positions), the culprit marks the merge set are cleared, and the
     * duplicate is a case of its own again. Rows deleted since are reported, not invented.
     */
    async undoMerge(entryId: number, reason: string, admin: SessionUser): Promise<{ entryId: number; fromCase: CaseDetail; intoCase: CaseDetail }> {
      const entry = await cases.auditEntry(entryId);
      if (!entry) throw AppError.notFound(`Audit entry ${entryId}`);
      if (entry.action !== 'case.merge') {
        throw new AppError(400, 'not_undoable', `Only case merges can be undone; audit entry ${entryId} records ${entry.action}`, { field: 'id' });
      }
      const parsed = caseMergeRecordSchema.safeParse(entry.details);
      const fromId = Number(entry.targetId);
      if (!parsed.success || entry.targetType !== 'case' || !Number.isInteger(fromId)) {
        throw new AppError(409, 'undo_unavailable', `Audit entry ${entryId} does not list the rows its merge moved, so it cannot be undone`);
      }
      const merge = parsed.data;
      const intoId = merge.intoCaseId;
      const unmergeId = await cases.withCasesLocked([fromId, intoId], async (store) => {
        const undoneBy = await store.undoOf(entryId, fromId);
        if (undoneBy !== null) {
          throw new AppError(409, 'already_undone', `The merge in audit entry ${entryId} was already undone (audit entry ${undoneBy})`, {
            undoneByEntryId: undoneBy,
          });
        }
        const from = await store.findCase(fromId);
        const into = await store.findCase(intoId);
        if (!from || !into) {
          throw new AppError(409, 'undo_unavailable', `Case ${from ? intoId : fromId} no longer exists, so the merge cannot be undone`);
        }
        if (from.mergedIntoId !== intoId) {
          throw new AppError(409, 'not_merged', `Case ${fromId} is no longer merged into case ${intoId}`);
        }
        if (into.mergedIntoId !== null) {
          throw new AppError(409, 'case_merged', `Case ${intoId} has since been merged into case ${into.mergedIntoId}: undo that merge first`, {
            mergedIntoId: into.mergedIntoId,
          });
        }

        const intoBefore = snapshotOf(fieldsOf(into), await store.linksOf(intoId));
        const { back, culpritCleared } = await store.moveBack(fromId, intoId, merge.moved, merge.culpritMarked);
        await store.setMergedInto(fromId, null);
        const intoAfter = snapshotOf(fieldsOf(into), await refreshBoth(store, fromId, intoId));
        const revisionId = await store.insertRevision(intoId, {
          editorId: admin.id,
          snapshot: intoAfter,
          changed: changedFields(intoBefore, intoAfter),
          summary: `undid the merge of case #${fromId} “${from.title}” into this case`,
        });
        const leftBehind = rowsLeftBehind(merge.moved, back);
        return store.writeAudit({
          actorId: admin.id,
          action: 'case.unmerge',
          targetType: 'case',
          targetId: String(fromId),
          reason,
          details: {
            undoes: entryId,
            intoCaseId: intoId,
            boardId: into.boardId,
            movedBack: countMoves(back),
            // rows the kept case no longer had (its author replaced its links since the merge)
            skipped: countMoves(leftBehind),
            skippedRows: leftBehind,
            culpritMarksCleared: culpritCleared.length,
            revisionId,
          },
        });
      });
      const [fromCase, intoCase] = await Promise.all([
        cases.findCase(fromId).then((record) => detail(record!, admin)),
        cases.findCase(intoId).then((record) => detail(record!, admin)),
      ]);
      return { entryId: unmergeId, fromCase, intoCase };
    },

    async moderateComment(commentId: number, action: 'hide' | 'restore', reason: string, moderator: SessionUser): Promise<CaseComment> {
      const { comment, record } = await moderatedComment(commentId, moderator);
      if (action === 'hide' && comment.hidden) throw new AppError(409, 'already_hidden', `Comment ${commentId} is already hidden`);
      if (action === 'restore' && !comment.hidden) throw new AppError(409, 'not_hidden', `Comment ${commentId} is not hidden`);
      await cases.moderateComment(commentId, action === 'hide' ? { at: new Date(), reason } : null, {
        actorId: moderator.id,
        action: `comment.${action}`,
        targetType: 'comment',
        targetId: String(commentId),
        reason,
        details: { case: record.id, author: comment.authorId },
      });
      const [updated] = await renderComments(record, [(await cases.commentById(commentId))!]);
      return updated!;
    },

    /** A member reports a case or a comment; every moderator is mailed (content_flagged). */
    async flag(target: 'case' | 'comment', contentId: number, reason: string, flagger: SessionUser): Promise<CaseFlag> {
      let record: CaseRecord;
      if (target === 'case') {
        record = await writableCase(contentId, flagger);
      } else {
        const comment = await cases.findComment(contentId);
        if (!comment || comment.deleted) throw AppError.notFound(`Comment ${contentId}`);
        record = await writableCase(comment.caseId, flagger);
        if (comment.hidden && comment.authorId !== flagger.id && !isModerator(flagger)) throw AppError.notFound(`Comment ${contentId}`);
      }
      const flagId = await cases.insertFlag(
        { contentType: target, contentId, flaggerId: flagger.id, reason },
        {
          kind: 'content_flagged',
          payload: {
            caseId: record.id,
            caseTitle: record.title,
            target,
            ...(target === 'comment' ? { commentId: contentId } : {}),
            flaggedByName: displayName(flagger),
            reason,
          },
        },
      );
      if (flagId === null) {
        throw new AppError(409, 'already_flagged', `You already flagged this ${target}; a moderator will look at it`);
      }
      return (await cases.flagById(flagId))!;
    },

    async flags(status: 'open' | 'resolved'): Promise<{ status: 'open' | 'resolved'; flags: CaseFlag[] }> {
      return { status, flags: await cases.listFlags(status) };
    },

    async resolveFlag(flagId: number, reason: string, moderator: SessionUser): Promise<CaseFlag> {
      const flag = await cases.flagById(flagId);
      if (!flag) throw AppError.notFound(`Flag ${flagId}`);
      if (flag.status !== 'open') throw new AppError(409, 'already_resolved', `Flag ${flagId} is already resolved`);
      const resolved = await cases.resolveFlag(flagId, moderator.id, reason, {
        actorId: moderator.id,
        action: 'flag.resolve',
        targetType: 'flag',
        targetId: String(flagId),
        reason,
        details: { contentType: flag.contentType, contentId: flag.contentId, flagger: flag.flagger.id },
      });
      if (!resolved) throw new AppError(409, 'already_resolved', `Flag ${flagId} is already resolved`);
      return (await cases.flagById(flagId))!;
    },
  };
}

export type CasebookService = ReturnType<typeof createCasebookService>;
