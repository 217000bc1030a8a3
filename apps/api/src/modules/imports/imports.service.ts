// The import flow shared by the HTTP upload, the CLI and the demo loader: read the files, check
// everything, and only then write the board in one transaction while the job row reports progress.
import type pg from 'pg';
import {
  assembleBoard,
  detectNetlistFormat,
  readAnnotationFile,
  readBoardFile,
  readIpcD356,
  readPartsCsv,
  readPinListCsv,
  type BoardDraft,
  type NetlistRead,
} from '@railyard/board-analysis';
import type { AnnotationFile, BoardMeta, ImportIssue, ImportJob, NetlistFormat } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import type { ImportsRepository } from './imports.repository';
import { storeBoardDraft } from './netlist-store';

export interface UploadedFile {
  name: string;
  bytes: Uint8Array;
}

export interface ImportInput {
  slug: string;
  format?: NetlistFormat;
  replace: boolean;
  /** metadata the user typed; wins over what the files say */
  meta?: Partial<BoardMeta>;
  netlist: UploadedFile;
  parts?: UploadedFile;
  annotations?: UploadedFile;
  /** who asked for the import, recorded on entered power links */
  enteredBy: string;
}

interface PreparedImport {
  format: NetlistFormat;
  draft: BoardDraft;
  meta: Partial<BoardMeta>;
  rootFromFile: boolean;
}

function decodeText(file: UploadedFile): { text: string } | { error: ImportIssue } {
  if (file.bytes.includes(0)) {
    return { error: { file: file.name, line: null, field: null, message: 'the file is binary, not a text netlist' } };
  }
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(file.bytes);
    return { text: text.replace(/^\uFEFF/, '') };
  } catch {
    return { error: { file: file.name, line: null, field: null, message: 'the file is not UTF-8 text' } };
  }
}

function withFile(issues: ImportIssue[], file: string): ImportIssue[] {
  return issues.map((i) => ({ ...i, file: i.file ?? file }));
}

function invalid(errors: ImportIssue[], warnings: ImportIssue[]): AppError {
  const count = `${errors.length} ${errors.length === 1 ? 'error' : 'errors'}`;
  return new AppError(400, 'import_invalid', `The files have ${count}; nothing was changed`, { errors, warnings });
}

export function prepareImport(input: ImportInput): PreparedImport {
  const decoded = [input.netlist, input.parts, input.annotations]
    .filter((f): f is UploadedFile => f !== undefined)
    .map((f) => ({ file: f, result: decodeText(f) }));
  const decodeErrors = decoded.flatMap((d) => ('error' in d.result ? [d.result.error] : []));
  if (decodeErrors.length > 0) throw invalid(decodeErrors, []);
  const text = (f: UploadedFile | undefined) => {
    const found = decoded.find((d) => d.file === f);
    return found && 'text' in found.result ? found.result.text : undefined;
  };

  const netlistText = text(input.netlist)!;
  const format = input.format ?? detectNetlistFormat(input.netlist.name, netlistText);
  if (!format) {
    throw new AppError(
      400,
      'unknown_format',
      `Could not tell the format of ${input.netlist.name}; choose ipc-d-356, csv or json`,
      { errors: [{ file: input.netlist.name, line: 1, field: 'format', message: 'not an IPC-D-356 netlist, a pin-list CSV or a railyard-board JSON file' }] },
    );
  }

  let netlist: NetlistRead;
  let annotations: AnnotationFile | null = null;
  const extraErrors: ImportIssue[] = [];
  if (format === 'json') {
    const read = readBoardFile(netlistText);
    netlist = read.netlist;
    annotations = read.annotations;
    if (input.annotations) {
      extraErrors.push({
        file: input.annotations.name,
        line: null,
        field: null,
        message: 'a railyard-board file carries its own annotations; send an annotations file only with an IPC-D-356 or CSV netlist',
      });
    }
  } else {
    netlist = format === 'ipc-d-356' ? readIpcD356(netlistText) : readPinListCsv(netlistText);
  }
  netlist = { ...netlist, errors: withFile(netlist.errors, input.netlist.name), warnings: withFile(netlist.warnings, input.netlist.name) };

  const parts = input.parts ? readPartsCsv(text(input.parts)!) : undefined;
  if (input.annotations && format !== 'json') {
    const read = readAnnotationFile(text(input.annotations)!);
    annotations = read.annotations;
    extraErrors.push(...withFile(read.errors, input.annotations.name));
  }

  const draft = assembleBoard({
    netlist,
    parts,
    annotations,
    fileNames: { netlist: input.netlist.name, parts: input.parts?.name, annotations: input.annotations?.name },
  });
  const errors = [...extraErrors, ...draft.errors];
  if (errors.length > 0) throw invalid(errors, draft.warnings);

  const meta: Partial<BoardMeta> = { ...netlist.meta, ...draft.meta, ...annotations?.board, ...input.meta };
  return { format, draft, meta, rootFromFile: Boolean(annotations?.rootNet) };
}

export function createImportsService(deps: {
  pool: pg.Pool;
  jobs: ImportsRepository;
  logger: Logger;
  /** drops this process's cached power graph at once (other processes hear the database notification) */
  boardChanged?: (boardId: number) => void;
}) {
  const { pool, jobs, logger, boardChanged } = deps;

  async function boardExists(slug: string): Promise<boolean> {
    const result = await pool.query('SELECT 1 FROM boards WHERE slug = $1', [slug]);
    return (result.rowCount ?? 0) > 0;
  }

  async function store(job: ImportJob, input: ImportInput, prepared: PreparedImport): Promise<ImportJob> {
    // Progress rows are written on their own connection, outside the import transaction, in order.
    let progressChain = Promise.resolve();
    let lastWrite = 0;
    const onProgress = (phase: string, progress: number) => {
      const now = Date.now();
      if (now - lastWrite < 100 && progress < 0.9) return;
      lastWrite = now;
      progressChain = progressChain.then(() => jobs.updateProgress(job.id, phase, progress)).catch(() => {});
    };

    const client = await pool.connect();
    try {
      await client.query('BEGIN');
      const summary = await storeBoardDraft(client, {
        slug: input.slug,
        meta: prepared.meta,
        replace: input.replace,
        draft: prepared.draft,
        rootFromFile: prepared.rootFromFile,
        enteredBy: input.enteredBy,
        onProgress,
      });
      await client.query('COMMIT');
      boardChanged?.(summary.boardId);
      await progressChain;
      const { boardId, warnings, ...rest } = summary;
      return await jobs.finishJob(job.id, { status: 'succeeded', boardId, summary: rest, warnings });
    } catch (error) {
      await client.query('ROLLBACK').catch(() => {});
      await progressChain;
      const message = error instanceof AppError ? error.message : 'the database refused the import; nothing was changed';
      if (!(error instanceof AppError)) logger.error({ err: error, job: job.id }, 'import failed');
      return await jobs.finishJob(job.id, { status: 'failed', errors: [{ line: null, field: null, message }] });
    } finally {
      client.release();
    }
  }

  return {
    /**
     * Checks the files, then starts writing. Bad files throw (400) before any job exists; a board that
     * already exists without `replace` throws 409. `done` settles when the job has finished.
     */
    async startImport(input: ImportInput): Promise<{ job: ImportJob; done: Promise<ImportJob> }> {
      const prepared = prepareImport(input);
      if (!input.replace && (await boardExists(input.slug))) {
        throw AppError.conflict(`Board "${input.slug}" already has a netlist; import with replace to replace it`);
      }
      const job = await jobs.createJob({
        boardSlug: input.slug,
        format: prepared.format,
        fileName: input.netlist.name,
        warnings: prepared.draft.warnings,
      });
      const done = store(job, input, prepared);
      return { job, done };
    },

    async getJob(id: string): Promise<ImportJob> {
      const job = await jobs.findJob(id);
      if (!job) throw AppError.notFound(`Import ${id}`);
      return job;
    },
  };
}

export type ImportsService = ReturnType<typeof createImportsService>;
