// A new power link at this rail: this rail at one end, the other net chosen from the board's nets,
// through one of the parts on this rail. Picking the part offers the other nets it touches.
import type { NetRow, PowerLinkKind, RailPart } from '@railyard/shared';
import { useId, useMemo, useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextInput } from '../../../components/ui/field';
import { ReasonField } from '../../../components/ui/reason-field';
import { isApiError } from '../../../lib/api-client';
import { reasonProblem } from '../../../lib/edit-reason';
import { naturalCompare } from '../../../lib/natural-order';
import { useAddPowerLink } from '../api/add-power-link';
import { checkNewLink, findNet, type LinkFieldErrors } from '../rail-edit-check';
import { linkKindHint, linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

type Direction = 'out' | 'in';
type Errors = LinkFieldErrors & { kind?: string; reason?: string };

const linkKinds = Object.keys(linkKindLabel) as PowerLinkKind[];

type AddPowerLinkFormProps = {
  slug: string;
  rail: string;
  parts: RailPart[];
  /** the board's nets for the other end; undefined while they load */
  nets: readonly NetRow[] | undefined;
};

export function AddPowerLinkForm({ slug, rail, parts, nets }: AddPowerLinkFormProps) {
  const id = useId();
  const [direction, setDirection] = useState<Direction>('out');
  const [otherNet, setOtherNet] = useState('');
  const [via, setVia] = useState('');
  const [kind, setKind] = useState<PowerLinkKind>('converter');
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const [added, setAdded] = useState<string | null>(null);
  const mutation = useAddPowerLink(slug);

  const otherNames = useMemo(
    () => (nets ?? []).map((net) => net.name).filter((name) => name !== rail),
    [nets, rail],
  );
  const sortedParts = useMemo(
    () => [...parts].sort((a, b) => naturalCompare(a.refdes, b.refdes)),
    [parts],
  );
  const viaPart = parts.find((part) => part.refdes.toUpperCase() === via.trim().toUpperCase());

  // The API names the end it refused as `from` or `to`; on this form that is always the other net,
  // since this rail's own end is known to exist.
  const apiError = isApiError(mutation.error) ? mutation.error : null;
  const fromApi = apiError?.fieldErrors ?? {};
  const apiOtherNet = fromApi.from ?? fromApi.to;
  const errorOf = {
    otherNet: errors.otherNet ?? apiOtherNet,
    via: errors.via ?? fromApi.via,
    kind: errors.kind ?? fromApi.kind,
    reason: errors.reason ?? fromApi.reason,
  };
  const unplaced =
    mutation.isError && !apiOtherNet && !fromApi.via && !fromApi.kind && !fromApi.reason;

  const edited = () => {
    setAdded(null);
    if (Object.keys(errors).length > 0) setErrors({});
  };

  const other = otherNet.trim() || 'another net';
  const from = direction === 'out' ? rail : other;
  const to = direction === 'out' ? other : rail;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Errors = checkNewLink({ otherNet, via }, rail, nets);
    const reasonError = reasonProblem(reason);
    if (reasonError) found.reason = reasonError;
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    // An alias typed for the other end is sent as the net's printed name.
    const otherName = (nets && findNet(nets, otherNet)?.name) ?? otherNet.trim();
    const link = {
      from: direction === 'out' ? rail : otherName,
      to: direction === 'out' ? otherName : rail,
      via: viaPart?.refdes ?? via.trim(),
      kind,
      reason: reason.trim(),
    };
    mutation.mutate(link, {
      onSuccess: () => {
        setAdded(`${link.from} → ${link.to} via ${link.via}`);
        setOtherNet('');
        setVia('');
        setReason('');
      },
    });
  };

  const choice = (pressed: boolean) =>
    `flex-1 cursor-pointer rounded-md border px-2 py-1 text-center text-[13px] has-focus-visible:outline-2 has-focus-visible:outline-offset-2 has-focus-visible:outline-accent ${
      pressed
        ? 'border-accent/60 bg-accent-soft text-ink'
        : 'border-line text-ink-muted hover:text-ink'
    }`;

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Add a power link at ${rail}`}
      className="space-y-3"
    >
      <fieldset>
        <legend className="sr-only">Direction of the power</legend>
        <div className="flex gap-1.5">
          <label className={choice(direction === 'out')}>
            <input
              type="radio"
              name={`${id}-direction`}
              className="sr-only"
              checked={direction === 'out'}
              onChange={() => {
                setDirection('out');
                edited();
              }}
            />
            <span className="font-mono">{rail}</span> feeds …
          </label>
          <label className={choice(direction === 'in')}>
            <input
              type="radio"
              name={`${id}-direction`}
              className="sr-only"
              checked={direction === 'in'}
              onChange={() => {
                setDirection('in');
                edited();
              }}
            />
            … feeds <span className="font-mono">{rail}</span>
          </label>
        </div>
      </fieldset>
      <Field
        label={direction === 'out' ? 'To net' : 'From net'}
        error={errorOf.otherNet}
        hint={nets ? undefined : 'Loading the board’s nets…'}
      >
        {(control) => (
          <>
            <TextInput
              {...control}
              list={`${id}-nets`}
              autoComplete="off"
              spellCheck={false}
              value={otherNet}
              placeholder="net name or alias"
              onChange={(event) => {
                setOtherNet(event.target.value);
                edited();
              }}
              className="font-mono"
            />
            <datalist id={`${id}-nets`}>
              {otherNames.map((name) => (
                <option key={name} value={name} />
              ))}
            </datalist>
          </>
        )}
      </Field>
      <Field label="Via part" error={errorOf.via} hint={`one of the parts on ${rail}`}>
        {(control) => (
          <>
            <TextInput
              {...control}
              list={`${id}-parts`}
              autoComplete="off"
              spellCheck={false}
              value={via}
              placeholder="refdes, e.g. U7"
              onChange={(event) => {
                setVia(event.target.value);
                edited();
              }}
              className="font-mono"
            />
            <datalist id={`${id}-parts`}>
              {sortedParts.map((part) => (
                <option key={part.refdes} value={part.refdes}>
                  {[part.kind, part.value].filter(Boolean).join(' ')}
                </option>
              ))}
            </datalist>
          </>
        )}
      </Field>
      {viaPart && viaPart.otherNets.length > 0 && (
        <div className="-mt-1 flex flex-wrap items-center gap-1 text-xs text-ink-muted">
          <span>
            <span className="font-mono">{viaPart.refdes}</span> also touches
          </span>
          {viaPart.otherNets.slice(0, 12).map((name) => (
            <button
              key={name}
              type="button"
              onClick={() => {
                setOtherNet(name);
                edited();
              }}
              className={`rounded border px-1.5 py-0.5 font-mono hover:text-ink ${
                name === otherNet.trim() ? 'border-accent/60 text-ink' : 'border-line'
              }`}
            >
              {name}
            </button>
          ))}
        </div>
      )}
      <Field label="Kind" error={errorOf.kind} hint={linkKindHint[kind]}>
        {(control) => (
          <Select
            {...control}
            value={kind}
            onChange={(event) => {
              setKind(event.target.value as PowerLinkKind);
              edited();
            }}
          >
            {linkKinds.map((option) => (
              <option key={option} value={option}>
                {linkKindLabel[option]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <ReasonField
        value={reason}
        error={errorOf.reason}
        placeholder="e.g. buck output traced on the bench"
        onChange={(value) => {
          setReason(value);
          edited();
        }}
      />
      <p className="flex items-center gap-2 font-mono text-xs text-ink-muted" aria-hidden="true">
        <span className="truncate">{from}</span>
        <PowerLinkGlyph kind={kind} width={24} />
        <span className="truncate">{to}</span>
        {via.trim() && <span className="shrink-0">via {via.trim()}</span>}
      </p>
      {unplaced && <ErrorPanel compact error={mutation.error} title="The link was not added" />}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" size="sm" disabled={mutation.isPending}>
          {mutation.isPending ? 'Adding…' : 'Add the link'}
        </Button>
        <p aria-live="polite" className="min-w-0 text-[13px] text-ok">
          {added ? `Added ${added}.` : ''}
        </p>
      </div>
    </form>
  );
}
