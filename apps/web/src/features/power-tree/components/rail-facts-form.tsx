// A moderator corrects what the netlist could not say about a rail: its nominal voltage, its kind
// and a description. Only what changed is sent; the reason goes to the audit log.
import type { NetKind, NetRow, NetUpdate } from '@railyard/shared';
import { useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextArea, UnitInput } from '../../../components/ui/field';
import { netKindLabel, netKindOrder } from '../../../components/ui/net-kind-badge';
import { ReasonField } from '../../../components/ui/reason-field';
import { isApiError } from '../../../lib/api-client';
import { reasonProblem } from '../../../lib/edit-reason';
import { useUpdateNet } from '../api/update-net';
import { readVolts } from '../rail-edit-check';

type Errors = Partial<
  Record<'nominalVoltage' | 'description' | 'kind' | 'reason' | 'form', string>
>;

const descriptionLimit = 2000;

export function RailFactsForm({ slug, net }: { slug: string; net: NetRow }) {
  const [volts, setVolts] = useState(net.nominalVoltage === null ? '' : String(net.nominalVoltage));
  const [kind, setKind] = useState<NetKind>(net.kind);
  const [description, setDescription] = useState(net.description);
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const [saved, setSaved] = useState(false);
  const mutation = useUpdateNet(slug, net.name);

  const apiError = isApiError(mutation.error) ? mutation.error : null;
  const fromApi = apiError?.fieldErrors ?? {};
  const errorOf = (field: keyof Errors) => errors[field] ?? fromApi[field];
  const unplaced =
    mutation.isError &&
    !['nominalVoltage', 'description', 'kind', 'reason'].some((field) => fromApi[field]);

  const edited = () => {
    setSaved(false);
    if (Object.keys(errors).length > 0) setErrors({});
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Errors = {};
    const reading = readVolts(volts);
    const change: Omit<NetUpdate, 'reason'> = {};
    if (!reading.ok) found.nominalVoltage = reading.error;
    else if (reading.volts !== net.nominalVoltage) change.nominalVoltage = reading.volts;
    if (kind !== net.kind) change.kind = kind;
    if (description.trim() !== net.description) change.description = description.trim();
    if (!found.nominalVoltage && Object.keys(change).length === 0) {
      found.form = 'Nothing to save: change the voltage, the kind or the description first.';
    }
    const reasonError = reasonProblem(reason);
    if (reasonError) found.reason = reasonError;
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    mutation.mutate(
      { ...change, reason: reason.trim() },
      {
        onSuccess: () => {
          setReason('');
          setSaved(true);
        },
      },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label={`Facts of ${net.name}`} className="space-y-3">
      <div className="grid grid-cols-[7.5rem_minmax(0,1fr)] gap-3">
        <Field label="Nominal voltage" error={errorOf('nominalVoltage')} hint="empty: not known">
          {(control) => (
            <UnitInput
              {...control}
              unit="V"
              inputMode="decimal"
              autoComplete="off"
              spellCheck={false}
              value={volts}
              placeholder="e.g. 3.3"
              onChange={(event) => {
                setVolts(event.target.value);
                edited();
              }}
            />
          )}
        </Field>
        <Field label="Kind" error={errorOf('kind')}>
          {(control) => (
            <Select
              {...control}
              value={kind}
              onChange={(event) => {
                setKind(event.target.value as NetKind);
                edited();
              }}
            >
              {netKindOrder.map((option) => (
                <option key={option} value={option}>
                  {netKindLabel[option]}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
      <Field label="Description" optional error={errorOf('description')}>
        {(control) => (
          <TextArea
            {...control}
            rows={2}
            maxLength={descriptionLimit}
            value={description}
            placeholder="What the rail powers, when it is on, what to measure"
            onChange={(event) => {
              setDescription(event.target.value);
              edited();
            }}
          />
        )}
      </Field>
      <ReasonField
        value={reason}
        error={errorOf('reason')}
        placeholder="e.g. measured 3.31 V at TP12"
        onChange={(value) => {
          setReason(value);
          edited();
        }}
      />
      {errors.form && (
        <p role="alert" className="text-[13px] text-danger">
          {errors.form}
        </p>
      )}
      {unplaced && <ErrorPanel compact error={mutation.error} title="Not saved" />}
      <div className="flex items-center gap-3">
        <Button type="submit" variant="primary" size="sm" disabled={mutation.isPending}>
          {mutation.isPending ? 'Saving…' : 'Save the rail'}
        </Button>
        <p aria-live="polite" className="text-[13px] text-ok">
          {saved ? 'Saved.' : ''}
        </p>
      </div>
    </form>
  );
}
