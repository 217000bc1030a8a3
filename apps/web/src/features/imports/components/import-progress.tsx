import type { ImportJob } from '@railyard/shared';
import type { ReactNode } from 'react';
import { ProgressBar } from '../../../components/ui/progress-bar';
import type { UploadProgress } from '../../../lib/api-client';
import { formatBytes, formatPercent } from '../../../lib/quantity-format';

type Props = {
  upload: UploadProgress | null;
  /** True once the server has accepted the files. */
  uploaded: boolean;
  job: ImportJob | null;
};

function Step({
  number,
  title,
  detail,
  state,
  children,
}: {
  number: number;
  title: string;
  detail: string;
  state: 'waiting' | 'active' | 'done' | 'failed';
  children: ReactNode;
}) {
  const mark =
    state === 'done' ? (
      <span className="text-ok" aria-label="done">
        ✓
      </span>
    ) : state === 'failed' ? (
      <span className="text-danger" aria-label="failed">
        ✕
      </span>
    ) : (
      <span className={state === 'active' ? 'text-accent' : 'text-ink-faint'}>{number}</span>
    );
  return (
    <li className={state === 'waiting' ? 'opacity-60' : ''}>
      <div className="mb-1.5 flex items-baseline gap-2 text-[13px]">
        <span className="inline-flex w-4 justify-center font-mono font-semibold">{mark}</span>
        <span className="font-medium">{title}</span>
        <span className="ml-auto font-mono text-xs text-ink-muted tabular">{detail}</span>
      </div>
      {children}
    </li>
  );
}

/** Two bars: bytes leaving the browser, then the server's own phases and progress. */
export function ImportProgress({ upload, uploaded, job }: Props) {
  const uploadFraction = uploaded
    ? 1
    : upload && upload.total > 0
      ? upload.loaded / upload.total
      : null;
  const uploadDetail = upload
    ? `${formatBytes(uploaded ? upload.total : upload.loaded)} of ${formatBytes(upload.total)}`
    : uploaded
      ? 'sent'
      : 'starting';

  const status = job?.status;
  const serverState =
    status === 'succeeded' ? 'done' : status === 'failed' ? 'failed' : job ? 'active' : 'waiting';
  const serverDetail = !job
    ? ''
    : status === 'queued'
      ? 'queued'
      : status === 'running'
        ? `${job.phase} · ${formatPercent(job.progress)}`
        : status === 'succeeded'
          ? 'finished'
          : `failed${job.phase ? ` while ${job.phase}` : ''}`;
  const serverValue =
    !job || status === 'queued' ? null : status === 'succeeded' ? 1 : job.progress;

  return (
    <ol className="space-y-3" aria-label="Import progress">
      <Step number={1} title="Upload" detail={uploadDetail} state={uploaded ? 'done' : 'active'}>
        <ProgressBar label="Upload" value={uploadFraction} tone={uploaded ? 'ok' : 'accent'} />
      </Step>
      <Step number={2} title="Import on the server" detail={serverDetail} state={serverState}>
        <ProgressBar
          label="Import on the server"
          value={serverState === 'waiting' ? 0 : serverValue}
          tone={status === 'succeeded' ? 'ok' : status === 'failed' ? 'danger' : 'accent'}
        />
      </Step>
    </ol>
  );
}
