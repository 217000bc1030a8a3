// Photos, thermal images and scope captures of a case, and for its author (or a moderator) a way to
// add more. An API without attachments answers 404 for the list: then this section is not shown.
import type { SessionUser } from '@railyard/shared';
import { useId, useState } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { FileInput } from '../../../components/ui/field';
import { ProgressBar } from '../../../components/ui/progress-bar';
import type { UploadProgress } from '../../../lib/api-client';
import { formatBytes } from '../../../lib/quantity-format';
import { hasRole } from '../../../lib/roles';
import { useDeleteAttachment } from '../api/delete-attachment';
import {
  attachmentsUnavailable,
  useAttachments,
  type CaseAttachment,
} from '../api/get-attachments';
import { useUploadAttachments } from '../api/upload-attachments';
import { CrossGlyph } from '../../../components/ui/glyph';

// What the API keeps (apps/api/src/modules/attachments/README.md): the type is read from the bytes,
// so this only narrows the file dialog.
const accepted = 'image/jpeg,image/png,image/webp,image/gif,application/pdf';

function Tile({
  attachment,
  mayRemove,
  onRemove,
  removing,
}: {
  attachment: CaseAttachment;
  mayRemove: boolean;
  onRemove: () => void;
  removing: boolean;
}) {
  const size =
    attachment.width && attachment.height ? `${attachment.width}×${attachment.height}` : null;
  return (
    <li className="group relative overflow-hidden rounded-md border border-line bg-sunken">
      <a
        href={attachment.url}
        target="_blank"
        rel="noopener"
        className="block"
        title={`Open ${attachment.name} in a new tab`}
      >
        {attachment.thumbnailUrl ? (
          <img
            src={attachment.thumbnailUrl}
            alt={attachment.name}
            loading="lazy"
            className="aspect-[4/3] w-full bg-raised object-cover"
          />
        ) : (
          <span className="grid aspect-[4/3] w-full place-items-center bg-raised text-ink-muted">
            <svg
              viewBox="0 0 24 24"
              width="28"
              height="28"
              aria-hidden="true"
              fill="none"
              stroke="currentColor"
              strokeWidth="1.4"
            >
              <path d="M6 2.5h8l4.5 4.5v14.5H6Z" strokeLinejoin="round" />
              <path d="M14 2.5V7h4.5" strokeLinejoin="round" />
            </svg>
            <span className="sr-only">{attachment.contentType}</span>
          </span>
        )}
        <span className="block truncate px-2 pt-1 text-xs text-ink">{attachment.name}</span>
        <span className="block px-2 pb-1.5 font-mono text-[11px] text-ink-faint">
          {formatBytes(attachment.byteSize)}
          {size && ` · ${size}`}
        </span>
      </a>
      {mayRemove && (
        <button
          type="button"
          onClick={onRemove}
          disabled={removing}
          aria-label={`Remove ${attachment.name}`}
          title="Remove"
          className="absolute top-1.5 right-1.5 inline-grid size-6 place-items-center rounded bg-surface/90 text-ink-muted opacity-0 ring-1 ring-line group-hover:opacity-100 hover:text-danger focus-visible:opacity-100"
        >
          <CrossGlyph size={10} />
        </button>
      )}
    </li>
  );
}

function UploadControl({ caseId }: { caseId: number }) {
  const id = useId();
  const [files, setFiles] = useState<File[]>([]);
  // A new key gives a fresh, empty file field after an upload.
  const [fieldKey, setFieldKey] = useState(0);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const upload = useUploadAttachments(caseId, setProgress);
  return (
    <form
      className="space-y-2 border-t border-line px-3 py-2.5"
      onSubmit={(event) => {
        event.preventDefault();
        if (files.length === 0) return;
        setProgress(null);
        upload.mutate(files, {
          onSuccess: () => {
            setFiles([]);
            setFieldKey((key) => key + 1);
          },
        });
      }}
    >
      <label htmlFor={`${id}-files`} className="text-[13px] font-medium">
        Add photos, thermal images or scope captures
      </label>
      <FileInput
        key={fieldKey}
        id={`${id}-files`}
        multiple
        accept={accepted}
        aria-describedby={`${id}-hint`}
        onChange={(event) => setFiles([...(event.target.files ?? [])])}
      />
      <p id={`${id}-hint`} className="text-xs text-ink-faint">
        JPEG, PNG, WebP, GIF or PDF. Pictures lose their metadata (location, camera serial) when
        stored.
      </p>
      {upload.isPending && (
        <ProgressBar
          label="Uploading"
          value={progress && progress.total > 0 ? progress.loaded / progress.total : null}
        />
      )}
      {upload.isError && <ErrorPanel compact error={upload.error} title="Nothing was attached" />}
      <Button type="submit" size="sm" disabled={files.length === 0 || upload.isPending}>
        {upload.isPending
          ? 'Uploading…'
          : files.length > 1
            ? `Attach ${files.length} files`
            : 'Attach'}
      </Button>
    </form>
  );
}

type CaseAttachmentsProps = {
  caseId: number;
  authorId: number;
  viewer: SessionUser | null | undefined;
};

export function CaseAttachments({ caseId, authorId, viewer }: CaseAttachmentsProps) {
  const list = useAttachments(caseId);
  const remove = useDeleteAttachment(caseId);
  if (list.isError && attachmentsUnavailable(list.error)) return null;
  const moderator = hasRole(viewer, 'moderator');
  const mayAttach = viewer != null && (viewer.id === authorId || moderator);
  const attachments = list.data ?? [];
  if (list.isSuccess && attachments.length === 0 && !mayAttach) return null;

  return (
    <section
      aria-labelledby="case-attachments-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="case-attachments-title" className="text-sm font-semibold">
          Pictures and captures
        </h2>
        {list.isSuccess && <span className="text-xs text-ink-muted">{attachments.length}</span>}
      </header>
      {list.isPending ? (
        <div aria-busy="true" className="m-3 h-20 animate-pulse rounded bg-raised">
          <span className="sr-only">Loading the attachments…</span>
        </div>
      ) : list.isError ? (
        <div className="p-3">
          <ErrorPanel compact error={list.error} title="Could not list the attachments" />
        </div>
      ) : attachments.length === 0 ? (
        <p className="px-3 py-2.5 text-[13px] text-ink-muted">Nothing attached yet.</p>
      ) : (
        <ul className="grid grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))] gap-2 p-3">
          {attachments.map((attachment) => (
            <Tile
              key={attachment.id}
              attachment={attachment}
              mayRemove={viewer != null && (viewer.id === attachment.uploaderId || moderator)}
              removing={remove.isPending && remove.variables === attachment.id}
              onRemove={() => remove.mutate(attachment.id)}
            />
          ))}
        </ul>
      )}
      {remove.isError && (
        <p role="alert" className="px-3 pb-2 text-[13px] text-danger">
          Not removed: {remove.error.message}
        </p>
      )}
      {mayAttach && list.isSuccess && <UploadControl caseId={caseId} />}
    </section>
  );
}
