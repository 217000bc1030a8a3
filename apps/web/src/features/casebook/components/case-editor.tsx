// Writing a repair up, or changing one's own write-up. Every field is checked with the API contract's
// schema as it is typed (once a save was tried), problems the API finds are shown on the field they
// name, and cases that look like this one are offered before it is saved.
import type { CaseDetail, CaseOutcome, CaseStatus, NetRow } from '@railyard/shared';
import { caseLimits } from '@railyard/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { useBlocker } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button, LinkButton } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, TextArea, TextInput } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCreateCase } from '../api/create-case';
import { forgetDeletedCase, useDeleteCase } from '../api/delete-case';
import { useBoardParts } from '../api/get-board-parts';
import { useUpdateCase } from '../api/update-case';
import {
  caseChanges,
  caseFormFrom,
  emptyCaseForm,
  payloadOf,
  readCaseForm,
  unknownNetErrors,
  type CaseForm,
  type FieldErrors,
} from '../case-form';
import { outcomeHint, outcomeLabel, outcomesInOrder } from '../case-vocabulary';
import { nameKey } from '../name-match';
import { similarCasesParams } from '../similar-cases-query';
import { formatMinutes, readMinutes } from '../time-spent';
import { NetsEditor, PartsEditor } from './case-links-editor';
import { LikelyDuplicates } from './likely-duplicates';
import { OutcomeGlyph } from './outcome-badge';
import { ReadingsEditor } from './readings-editor';

const markdownHint = 'Markdown. Net names and part designators of this board become links.';

function Section({
  id,
  title,
  description,
  children,
}: {
  id: string;
  title: string;
  description?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="rounded-md border border-line bg-surface">
      <header className="border-b border-line px-3 py-2">
        <h2 id={id} className="text-sm font-semibold">
          {title}
        </h2>
        {description && <p className="mt-0.5 text-xs text-ink-muted">{description}</p>}
      </header>
      <div className="space-y-3 px-3 py-3">{children}</div>
    </section>
  );
}

/** Hands-on steps with heat, injected current or a battery: the write-up says how it was made safe. */
function FixCaution() {
  return (
    <aside
      aria-label="Safety note for the write-up"
      className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[13px] leading-snug"
    >
      <p>
        <span className="font-semibold text-caution">Hot air, injected current or a battery?</span>{' '}
        Say so in the steps: that the battery was disconnected first, the voltage and current limit
        the supply was set to, and which parts got hot, so the next person does it as safely.
      </p>
    </aside>
  );
}

function OutcomeField({
  value,
  error,
  onChange,
}: {
  value: CaseOutcome | '';
  error: string | undefined;
  onChange: (outcome: CaseOutcome) => void;
}) {
  return (
    <fieldset aria-describedby={error ? 'case-outcome-error' : undefined}>
      <legend className="text-[13px] font-medium">How it ended</legend>
      <div className="mt-1 flex flex-wrap gap-1.5">
        {outcomesInOrder.map((outcome) => {
          const checked = value === outcome;
          return (
            <label
              key={outcome}
              title={outcomeHint[outcome]}
              className={`inline-flex h-8 cursor-pointer items-center gap-1.5 rounded-md border px-2.5 text-[13px] has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent ${
                checked
                  ? 'border-accent/60 bg-accent-soft text-ink'
                  : error
                    ? 'border-danger text-ink-muted hover:text-ink'
                    : 'border-line text-ink-muted hover:border-line-strong hover:text-ink'
              }`}
            >
              <input
                type="radio"
                name="case-outcome"
                value={outcome}
                checked={checked}
                aria-invalid={error ? true : undefined}
                onChange={() => onChange(outcome)}
                className="sr-only"
              />
              <OutcomeGlyph outcome={outcome} />
              {outcomeLabel[outcome]}
            </label>
          );
        })}
      </div>
      {error && (
        <p id="case-outcome-error" className="mt-1 text-[13px] text-danger first-letter:uppercase">
          {error}
        </p>
      )}
    </fieldset>
  );
}

function minutesHint(text: string): string {
  const read = readMinutes(text);
  return read.ok && read.minutes !== null ? `= ${formatMinutes(read.minutes)}` : 'minutes, or 1:35';
}

function formWithoutRowKeys(form: CaseForm): string {
  return JSON.stringify({ ...form, readings: form.readings.map(({ key: _key, ...row }) => row) });
}

type CaseEditorProps = {
  slug: string;
  /** the board's nets; undefined while they load */
  boardNets: readonly NetRow[] | undefined;
  /** the case being edited; without it a new case is written */
  existing?: CaseDetail;
  /** nets and parts a new case starts with (from the page it was opened on) */
  preset?: { nets?: string[]; parts?: string[] };
  cancelHref: string;
  onSaved: (saved: CaseDetail) => void;
  /** after a draft was deleted: leaves the page (the cached case is dropped once it resolves) */
  onDeleted?: () => void | Promise<void>;
};

export function CaseEditor({
  slug,
  boardNets,
  existing,
  preset,
  cancelHref,
  onSaved,
  onDeleted,
}: CaseEditorProps) {
  const [initial] = useState(() => (existing ? caseFormFrom(existing) : emptyCaseForm(preset)));
  const [form, setForm] = useState<CaseForm>(initial);
  const [tried, setTried] = useState<CaseStatus | null>(null);
  const [nothingChanged, setNothingChanged] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const leaving = useRef(false);

  const queryClient = useQueryClient();
  const parts = useBoardParts(slug);
  const create = useCreateCase(slug);
  const update = useUpdateCase(slug, existing?.id ?? 0);
  const remove = useDeleteCase(slug, existing?.id ?? 0);
  const saving = existing ? update : create;
  const published = existing?.status === 'published';

  const set = (patch: Partial<CaseForm>) => {
    setNothingChanged(false);
    setForm((current) => ({ ...current, ...patch }));
  };

  const isBoardNet = useMemo(() => {
    if (!boardNets) return null;
    const keys = new Set<string>();
    for (const net of boardNets) {
      for (const name of [net.name, ...net.aliases]) keys.add(nameKey(name));
    }
    return (name: string) => keys.has(nameKey(name));
  }, [boardNets]);

  // Problems show once a save was tried, and then follow the typing.
  const clientErrors: FieldErrors = useMemo(() => {
    if (tried === null) return {};
    const read = readCaseForm(form, tried);
    return {
      ...(read.ok ? {} : read.errors),
      ...(isBoardNet ? unknownNetErrors(form, isBoardNet) : {}),
    };
  }, [form, tried, isBoardNet]);
  const apiError = isApiError(saving.error) ? saving.error : null;
  const serverErrors = apiError?.fieldErrors ?? {};
  const errors: FieldErrors = { ...serverErrors, ...clientErrors };
  const errorOf = (field: string) => errors[field];
  const placed = Object.keys(serverErrors).length > 0;

  const dirty = formWithoutRowKeys(form) !== formWithoutRowKeys(initial);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty && !leaving.current && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const similar = similarCasesParams(form, existing?.id);

  const focusFirstProblem = () =>
    requestAnimationFrame(() =>
      formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus(),
    );

  const save = (status: CaseStatus) => {
    setTried(status);
    setNothingChanged(false);
    const read = readCaseForm(form, status);
    const unknown = isBoardNet ? unknownNetErrors(form, isBoardNet) : {};
    if (!read.ok || Object.keys(unknown).length > 0) {
      focusFirstProblem();
      return;
    }
    const finish = (saved: CaseDetail) => {
      leaving.current = true;
      onSaved(saved);
    };
    if (existing) {
      const change = caseChanges(payloadOf(existing), read.payload);
      if (Object.keys(change).length === 0) {
        setNothingChanged(true);
        return;
      }
      update.mutate(change, { onSuccess: finish, onError: focusFirstProblem });
    } else {
      create.mutate(read.payload, { onSuccess: finish, onError: focusFirstProblem });
    }
  };

  const defaultNet = form.readings.at(-1)?.net ?? form.nets[0] ?? '';

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        save(published ? 'published' : 'draft');
      }}
      className="grid items-start gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]"
    >
      <div className="min-w-0 space-y-3">
        <Section id="case-fault-title" title="The fault">
          <Field
            label="Title"
            error={errorOf('title')}
            hint="The symptom and what it turned out to be, e.g. “No boot: VDD_MEM shorted by C4005”."
          >
            {(control) => (
              <TextInput
                {...control}
                autoFocus={!existing}
                maxLength={caseLimits.title}
                value={form.title}
                onChange={(event) => set({ title: event.target.value })}
              />
            )}
          </Field>
          <Field
            label="Symptom"
            error={errorOf('symptom')}
            hint="What the board did, as the customer or the bench supply showed it."
          >
            {(control) => (
              <TextArea
                {...control}
                rows={3}
                maxLength={caseLimits.symptom}
                value={form.symptom}
                onChange={(event) => set({ symptom: event.target.value })}
              />
            )}
          </Field>
          <div className="flex flex-wrap items-start gap-x-8 gap-y-3">
            <OutcomeField
              value={form.outcome}
              error={errorOf('outcome')}
              onChange={(outcome) => set({ outcome })}
            />
            <div className="w-44">
              <Field
                label="Time it took"
                optional
                error={errorOf('minutesSpent')}
                hint={minutesHint(form.minutes)}
              >
                {(control) => (
                  <TextInput
                    {...control}
                    inputMode="numeric"
                    autoComplete="off"
                    placeholder="e.g. 45"
                    value={form.minutes}
                    onChange={(event) => set({ minutes: event.target.value })}
                  />
                )}
              </Field>
            </div>
          </div>
        </Section>

        <Section
          id="case-links-title"
          title="Nets and parts"
          description="What the fault was on. Nets you took readings on are linked as well."
        >
          <Field label="Nets" hint="Rails and signals the fault showed on or was traced along.">
            {(control) => (
              <NetsEditor
                id={control.id}
                describedBy={control['aria-describedby']}
                nets={form.nets}
                boardNets={boardNets}
                errors={errors}
                max={caseLimits.nets}
                onChange={(nets) => set({ nets })}
              />
            )}
          </Field>
          <Field
            label="Parts"
            hint="Tick “culprit” for the part that was at fault and got replaced or removed."
          >
            {(control) => (
              <PartsEditor
                id={control.id}
                describedBy={control['aria-describedby']}
                parts={form.parts}
                boardParts={parts.data?.components}
                partsUnavailable={parts.isError}
                errors={errors}
                max={caseLimits.components}
                onChange={(next) => set({ parts: next })}
              />
            )}
          </Field>
          {parts.isError && (
            <p className="text-xs text-caution">
              The board’s parts list did not load ({parts.error.message}): type designators and
              press Enter; saving checks them.
            </p>
          )}
        </Section>

        <Section
          id="case-readings-title"
          title="Readings"
          description="Against a known-good board of the same board number, same probe orientation. Resistances also take 4.7k or 4K7, voltages 336 mV."
        >
          <ReadingsEditor
            rows={form.readings}
            nets={boardNets}
            errors={errors}
            defaultNet={defaultNet}
            maxRows={caseLimits.readings}
            onChange={(readings) => set({ readings })}
          />
        </Section>

        <Section id="case-fix-title" title="Cause and fix">
          <Field label="Root cause" optional error={errorOf('rootCause')} hint={markdownHint}>
            {(control) => (
              <TextArea
                {...control}
                rows={3}
                maxLength={caseLimits.rootCause}
                value={form.rootCause}
                placeholder="What was wrong, and how you knew"
                onChange={(event) => set({ rootCause: event.target.value })}
              />
            )}
          </Field>
          <FixCaution />
          <Field label="Fix steps" optional error={errorOf('fixSteps')} hint={markdownHint}>
            {(control) => (
              <TextArea
                {...control}
                rows={6}
                maxLength={caseLimits.fixSteps}
                value={form.fixSteps}
                placeholder={'1. Disconnect the battery.\n2. …'}
                onChange={(event) => set({ fixSteps: event.target.value })}
              />
            )}
          </Field>
          <Field label="Notes" optional error={errorOf('body')} hint={markdownHint}>
            {(control) => (
              <TextArea
                {...control}
                rows={5}
                maxLength={caseLimits.body}
                value={form.body}
                placeholder="Dead ends, what misled you, what to check next time"
                onChange={(event) => set({ body: event.target.value })}
              />
            )}
          </Field>
        </Section>

        {saving.isError && !placed && <ErrorPanel compact error={saving.error} title="Not saved" />}
        {saving.isError && placed && (
          <p role="alert" className="text-[13px] text-danger">
            Not saved: {saving.error.message}. The fields it names are marked above.
          </p>
        )}
        {tried !== null && Object.keys(clientErrors).length > 0 && (
          <p role="alert" className="text-[13px] text-danger">
            Some fields need another look before saving; they are marked.
          </p>
        )}
        {nothingChanged && (
          <p role="status" className="text-[13px] text-ink-muted">
            Nothing changed since the last save.
          </p>
        )}

        <div className="flex flex-wrap items-center gap-2 rounded-md border border-line bg-surface px-3 py-2.5">
          {published ? (
            <Button type="submit" variant="primary" disabled={saving.isPending}>
              {saving.isPending ? 'Saving…' : 'Save the changes'}
            </Button>
          ) : (
            <>
              <Button
                variant="primary"
                disabled={saving.isPending}
                onClick={() => save('published')}
              >
                {saving.isPending && tried === 'published' ? 'Publishing…' : 'Publish'}
              </Button>
              <Button type="submit" disabled={saving.isPending}>
                {saving.isPending && tried === 'draft' ? 'Saving…' : 'Save as draft'}
              </Button>
            </>
          )}
          <LinkButton variant="ghost" to={cancelHref}>
            Cancel
          </LinkButton>
          <p className="text-xs text-ink-muted">
            {published
              ? 'Every save is kept in the case’s history.'
              : 'A draft is seen only by you. Once published, a case stays published.'}
          </p>
          {existing && !published && (
            <Button
              variant="ghost"
              className="ml-auto text-danger"
              onClick={() => setDeleting(true)}
            >
              Delete the draft
            </Button>
          )}
        </div>
      </div>

      <div className="space-y-3 lg:sticky lg:top-14">
        <LikelyDuplicates slug={slug} params={similar} />
      </div>

      <Dialog
        open={blocker.state === 'blocked'}
        onClose={() => {
          if (blocker.state === 'blocked') blocker.reset();
        }}
        title="Leave without saving?"
        description="What you changed in this write-up is not saved yet."
      >
        <div className="flex justify-end gap-2">
          <Button size="sm" variant="ghost" onClick={() => blocker.reset?.()}>
            Stay and keep writing
          </Button>
          <Button size="sm" variant="danger" onClick={() => blocker.proceed?.()}>
            Leave, drop the changes
          </Button>
        </div>
      </Dialog>

      {existing && (
        <Dialog
          open={deleting}
          onClose={() => setDeleting(false)}
          title="Delete this draft?"
          description="The draft and its history are gone for good."
        >
          {remove.isError && <ErrorPanel compact error={remove.error} title="Not deleted" />}
          <div className="mt-3 flex justify-end gap-2">
            <Button size="sm" variant="ghost" onClick={() => setDeleting(false)}>
              Keep it
            </Button>
            <Button
              size="sm"
              variant="danger"
              disabled={remove.isPending}
              onClick={() =>
                remove.mutate(undefined, {
                  onSuccess: async () => {
                    leaving.current = true;
                    setDeleting(false);
                    await onDeleted?.();
                    forgetDeletedCase(queryClient, existing.id);
                  },
                })
              }
            >
              {remove.isPending ? 'Deleting…' : 'Delete the draft'}
            </Button>
          </div>
        </Dialog>
      )}
    </form>
  );
}
