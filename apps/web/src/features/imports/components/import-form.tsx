// Upload a netlist (plus optional parts list and annotations) and follow the import job
// to its end. The job id sits in the URL (?job=), so a reload keeps showing its progress.
import { netlistFormats, type ImportJob, type NetlistFormat } from '@railyard/shared';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Field, FileInput, Select, TextArea, TextInput } from '../../../components/ui/field';
import { isApiError, type UploadProgress } from '../../../lib/api-client';
import { formatBytes } from '../../../lib/quantity-format';
import { useCreateImport, type CreateImportInput } from '../api/create-import';
import { isFinished, useImport } from '../api/get-import';
import {
  checkNewBoard,
  emptyBoardFields,
  formFieldOf,
  slugFromTitle,
  type BoardFieldName,
  type BoardFields,
  type FieldErrors,
} from '../import-form-check';
import { refusedImportIssues } from '../refused-import-issues';
import { ImportIssuesTable } from './import-issues-table';
import { ImportProgress } from './import-progress';
import { ImportSummary } from './import-summary';

export type ImportTarget =
  { kind: 'new' } | { kind: 'existing'; slug: string; title: string; netCount: number };

const formatLabels: Record<NetlistFormat, string> = {
  'ipc-d-356': 'IPC-D-356 netlist',
  csv: 'Pin-list CSV',
  json: 'Railyard board JSON',
};

type Files = { netlist: File | null; parts: File | null; annotations: File | null };
const noFiles: Files = { netlist: null, parts: null, annotations: null };

function fileHint(file: File | null, otherwise: string) {
  return file ? formatBytes(file.size) : otherwise;
}

type ImportFormProps = {
  target: ImportTarget;
  /** Called once when the job finishes well, so the caller can refresh what it shows. */
  onSucceeded: (job: ImportJob) => void;
};

export function ImportForm({ target, onSucceeded }: ImportFormProps) {
  const [searchParams, setSearchParams] = useSearchParams();
  const jobId = searchParams.get('job');

  const [fields, setFields] = useState<BoardFields>(emptyBoardFields);
  const [slugEdited, setSlugEdited] = useState(false);
  const [files, setFiles] = useState<Files>(noFiles);
  const [format, setFormat] = useState<NetlistFormat | ''>('');
  const [replace, setReplace] = useState(false);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [upload, setUpload] = useState<UploadProgress | null>(null);
  // File inputs cannot be cleared through React state; a new key gives fresh ones.
  const [fileInputsKey, setFileInputsKey] = useState(0);
  const formRef = useRef<HTMLFormElement>(null);

  const setJob = (id: string | null) =>
    setSearchParams(
      (params) => {
        const next = new URLSearchParams(params);
        if (id === null) next.delete('job');
        else next.set('job', id);
        return next;
      },
      { replace: true },
    );

  const mutation = useCreateImport({ onUploadProgress: setUpload });
  const jobQuery = useImport(jobId);
  const job = jobQuery.data?.job ?? null;
  const running = mutation.isPending || (jobId !== null && (!job || !isFinished(job.status)));

  const reported = useRef<string | null>(null);
  useEffect(() => {
    if (job?.status === 'succeeded' && reported.current !== job.id) {
      reported.current = job.id;
      onSucceeded(job);
    }
  }, [job, onSucceeded]);

  // Issues the API tied to a field are shown on that field, like the client's own checks.
  const apiError = isApiError(mutation.error) ? mutation.error : null;
  const apiFieldErrors: FieldErrors = {};
  for (const issue of apiError?.issues ?? []) {
    const field = formFieldOf(issue.field);
    if (field) apiFieldErrors[field] ??= issue.message;
  }
  const fieldError = (name: BoardFieldName | 'netlist') => errors[name] ?? apiFieldErrors[name];
  // A refused upload (400 import_invalid) lists every problem of the files, by file, line and field.
  const refused = refusedImportIssues(apiError?.details);

  const setField = (name: BoardFieldName, value: string) => {
    setFields((current) => {
      const next = { ...current, [name]: value };
      if (name === 'title' && !slugEdited) next.slug = slugFromTitle(value);
      return next;
    });
    if (errors[name]) setErrors(({ [name]: _, ...rest }) => rest);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: FieldErrors = {};
    let slug: string | null = null;
    let board: CreateImportInput['board'] = null;
    if (target.kind === 'new') {
      const check = checkNewBoard(fields);
      if (check.ok) {
        slug = check.slug;
        board = check.meta;
      } else Object.assign(found, check.errors);
    } else {
      slug = target.slug;
    }
    if (!files.netlist) found.netlist = 'Choose the netlist file';

    setErrors(found);
    if (Object.keys(found).length > 0 || !slug || !files.netlist) {
      requestAnimationFrame(() =>
        formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus(),
      );
      return;
    }
    setUpload(null);
    // A finished job's results give way to the new upload's progress.
    if (jobId !== null) setJob(null);
    mutation.mutate(
      {
        slug,
        netlist: files.netlist,
        parts: files.parts,
        annotations: files.annotations,
        format: format || null,
        replace: target.kind === 'existing' && replace,
        board,
      },
      { onSuccess: (response) => setJob(response.job.id) },
    );
  };

  const startOver = () => {
    mutation.reset();
    setUpload(null);
    setFiles(noFiles);
    setFileInputsKey((key) => key + 1);
    setJob(null);
  };

  const showProgress = mutation.isPending || jobId !== null;
  const finished = job !== null && isFinished(job.status);

  return (
    <div className="space-y-4">
      <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,40rem)_minmax(0,1fr)]">
        <form ref={formRef} onSubmit={submit} noValidate className="space-y-5">
          <fieldset disabled={running} className="space-y-5">
            {target.kind === 'new' && (
              <fieldset className="rounded-lg border border-line bg-surface p-4">
                <legend className="px-1 text-sm font-semibold">Board</legend>
                <div className="grid gap-3 sm:grid-cols-2">
                  <div className="sm:col-span-2">
                    <Field label="Title" error={fieldError('title')}>
                      {(control) => (
                        <TextInput
                          {...control}
                          value={fields.title}
                          onChange={(e) => setField('title', e.target.value)}
                          placeholder="Demo mainboard A"
                          autoFocus
                        />
                      )}
                    </Field>
                  </div>
                  <Field
                    label="Slug"
                    error={fieldError('slug')}
                    hint="The board's address: /boards/slug"
                  >
                    {(control) => (
                      <TextInput
                        {...control}
                        value={fields.slug}
                        onChange={(e) => {
                          setSlugEdited(true);
                          setField('slug', e.target.value);
                        }}
                        spellCheck={false}
                        autoCapitalize="none"
                        className="font-mono"
                        placeholder="demo-mainboard-a"
                      />
                    )}
                  </Field>
                  <Field label="Device family" optional error={fieldError('deviceFamily')}>
                    {(control) => (
                      <TextInput
                        {...control}
                        value={fields.deviceFamily}
                        onChange={(e) => setField('deviceFamily', e.target.value)}
                        placeholder="13-inch laptop"
                      />
                    )}
                  </Field>
                  <Field label="Board number" optional error={fieldError('boardNumber')}>
                    {(control) => (
                      <TextInput
                        {...control}
                        value={fields.boardNumber}
                        onChange={(e) => setField('boardNumber', e.target.value)}
                        className="font-mono"
                        spellCheck={false}
                      />
                    )}
                  </Field>
                  <div className="grid grid-cols-2 gap-3">
                    <Field label="Revision" optional error={fieldError('revision')}>
                      {(control) => (
                        <TextInput
                          {...control}
                          value={fields.revision}
                          onChange={(e) => setField('revision', e.target.value)}
                          className="font-mono"
                          spellCheck={false}
                        />
                      )}
                    </Field>
                    <Field label="Battery (V)" optional error={fieldError('batteryVoltage')}>
                      {(control) => (
                        <TextInput
                          {...control}
                          value={fields.batteryVoltage}
                          onChange={(e) => setField('batteryVoltage', e.target.value)}
                          inputMode="decimal"
                          className="font-mono"
                          placeholder="11.4"
                        />
                      )}
                    </Field>
                  </div>
                  <div className="sm:col-span-2">
                    <Field label="Notes" optional error={fieldError('notes')}>
                      {(control) => (
                        <TextArea
                          {...control}
                          rows={2}
                          value={fields.notes}
                          onChange={(e) => setField('notes', e.target.value)}
                        />
                      )}
                    </Field>
                  </div>
                </div>
              </fieldset>
            )}

            <fieldset key={fileInputsKey} className="rounded-lg border border-line bg-surface p-4">
              <legend className="px-1 text-sm font-semibold">Files</legend>
              <div className="grid gap-3">
                <Field
                  label="Netlist"
                  error={fieldError('netlist')}
                  hint={fileHint(files.netlist, 'IPC-D-356, pin-list CSV or Railyard board JSON')}
                >
                  {(control) => (
                    <FileInput
                      {...control}
                      onChange={(e) => {
                        const netlist = e.target.files?.[0] ?? null;
                        setFiles((current) => ({ ...current, netlist }));
                        if (netlist) setErrors(({ netlist: _, ...rest }) => rest);
                      }}
                    />
                  )}
                </Field>
                <div className="grid gap-3 sm:grid-cols-2">
                  <Field
                    label="Parts list"
                    optional
                    hint={fileHint(files.parts, 'CSV columns: refdes, value, package')}
                  >
                    {(control) => (
                      <FileInput
                        {...control}
                        accept=".csv,text/csv"
                        onChange={(e) => {
                          const parts = e.target.files?.[0] ?? null;
                          setFiles((current) => ({ ...current, parts }));
                        }}
                      />
                    )}
                  </Field>
                  <Field
                    label="Annotations"
                    optional
                    hint={fileHint(files.annotations, 'railyard-annotations JSON: voltages, links')}
                  >
                    {(control) => (
                      <FileInput
                        {...control}
                        accept=".json,application/json"
                        onChange={(e) => {
                          const annotations = e.target.files?.[0] ?? null;
                          setFiles((current) => ({ ...current, annotations }));
                        }}
                      />
                    )}
                  </Field>
                </div>
                <div className="grid gap-3 sm:grid-cols-2">
                  <Field label="Netlist format">
                    {(control) => (
                      <Select
                        {...control}
                        value={format}
                        onChange={(e) => setFormat(e.target.value as NetlistFormat | '')}
                      >
                        <option value="">Detect from the file</option>
                        {netlistFormats.map((value) => (
                          <option key={value} value={value}>
                            {formatLabels[value]}
                          </option>
                        ))}
                      </Select>
                    )}
                  </Field>
                </div>
                {target.kind === 'existing' && (
                  <label className="flex items-start gap-2.5 rounded-md border border-line bg-sunken px-3 py-2.5 text-sm">
                    <input
                      type="checkbox"
                      checked={replace}
                      onChange={(e) => setReplace(e.target.checked)}
                      className="mt-0.5 size-4 accent-[var(--ry-accent)]"
                    />
                    <span>
                      <span className="font-medium">Replace the netlist</span>
                      <span className="block text-[13px] text-ink-muted">
                        The board's {target.netCount.toLocaleString('en-US')} nets and their parts
                        give way to the new file; annotations on nets that still exist carry over.
                      </span>
                    </span>
                  </label>
                )}
              </div>
            </fieldset>
          </fieldset>

          {apiError && <ErrorPanel compact error={apiError} title="The import was refused" />}
          {mutation.error && !apiError && <ErrorPanel compact error={mutation.error} />}

          <div className="flex items-center gap-3">
            <Button type="submit" variant="primary" disabled={running}>
              {running ? 'Importing…' : 'Upload and import'}
            </Button>
            {finished && (
              <Button variant="ghost" onClick={startOver}>
                Clear the files
              </Button>
            )}
            {target.kind === 'existing' && (
              <span className="text-[13px] text-ink-muted">
                into <span className="font-medium text-ink">{target.title}</span>
              </span>
            )}
          </div>
        </form>

        <div className="space-y-4 lg:sticky lg:top-15">
          {showProgress ? (
            <section
              aria-label="Import status"
              className="rounded-lg border border-line bg-surface p-4"
            >
              <ImportProgress upload={upload} uploaded={jobId !== null} job={job} />
              {jobQuery.error && (
                <div className="mt-3">
                  <ErrorPanel compact error={jobQuery.error} title="Lost track of the import" />
                </div>
              )}
            </section>
          ) : (
            <ImportHelp />
          )}
          {job?.status === 'succeeded' && job.summary && (
            <ImportSummary job={job} summary={job.summary} />
          )}
          {job?.status === 'failed' && (
            <div role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-4">
              <h2 className="text-base font-semibold text-danger">The import failed</h2>
              <p className="mt-1 text-sm">
                {job.errors.length > 0
                  ? `${job.errors.length.toLocaleString('en-US')} problem${job.errors.length === 1 ? '' : 's'} listed below.`
                  : 'The server gave no detail.'}
              </p>
            </div>
          )}
        </div>
      </div>

      {job && <ImportIssuesTable title="Errors" issues={job.errors} tone="danger" />}
      {job && <ImportIssuesTable title="Warnings" issues={job.warnings} tone="caution" />}
      {!job && <ImportIssuesTable title="Errors" issues={refused.errors} tone="danger" />}
      {!job && <ImportIssuesTable title="Warnings" issues={refused.warnings} tone="caution" />}
    </div>
  );
}

function ImportHelp() {
  return (
    <aside className="rounded-lg border border-line bg-surface p-4 text-[13px] text-ink-muted">
      <h2 className="text-sm font-semibold text-ink">What each file gives the board</h2>
      <dl className="mt-2 space-y-2">
        <div>
          <dt className="font-medium text-ink">Netlist</dt>
          <dd>Nets, components and the pin of each component on each net.</dd>
        </div>
        <div>
          <dt className="font-medium text-ink">Parts list</dt>
          <dd>Values and packages by refdes, when the netlist lacks them.</dd>
        </div>
        <div>
          <dt className="font-medium text-ink">Annotations</dt>
          <dd>
            Nominal voltages, descriptions, aliases and the converters and switches between rails.
          </dd>
        </div>
      </dl>
      <p className="mt-3">
        The upload is checked line by line; every problem comes back with its file, line and field.
      </p>
    </aside>
  );
}
