// Comments under a case, in Markdown like the write-up. Everyone signed in comments on a published
// case; people edit and delete their own; a moderator may edit or delete anyone's and says why
// (the audit log keeps it with the old text).
import type { CaseComment, SessionUser } from '@railyard/shared';
import { useState, type FormEvent } from 'react';
import { useLocation } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Avatar } from '../../../components/ui/avatar';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, TextArea } from '../../../components/ui/field';
import { ReasonField } from '../../../components/ui/reason-field';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/date-format';
import { reasonProblem } from '../../../lib/edit-reason';
import { formatCount } from '../../../lib/quantity-format';
import { hasRole } from '../../../lib/roles';
import { useAddComment } from '../api/add-comment';
import { useDeleteComment } from '../api/delete-comment';
import { useComments } from '../api/get-comments';
import { useUpdateComment } from '../api/update-comment';
import { commentMaxLength } from '../case-vocabulary';
import { CaseHtml } from './case-html';
import { PersonName } from './case-marks';

const markdownHint = 'Markdown. Net names and part designators of this board become links.';

function commentProblem(body: string): string | undefined {
  const trimmed = body.trim();
  if (trimmed === '') return 'Write something first.';
  if (trimmed.length > commentMaxLength) {
    return `Keep it under ${commentMaxLength.toLocaleString('en')} characters.`;
  }
  return undefined;
}

function CommentEditor({
  caseId,
  comment,
  asModerator,
  onDone,
}: {
  caseId: number;
  comment: CaseComment;
  /** editing someone else's comment as a moderator: a reason is asked for */
  asModerator: boolean;
  onDone: () => void;
}) {
  const [body, setBody] = useState(comment.body);
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<{ body?: string; reason?: string }>({});
  const update = useUpdateComment(caseId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = {
      body: commentProblem(body),
      reason: asModerator ? reasonProblem(reason) : undefined,
    };
    setErrors(found);
    if (found.body || found.reason) return;
    update.mutate(
      { id: comment.id, body: body.trim(), reason: asModerator ? reason.trim() : undefined },
      { onSuccess: onDone },
    );
  };

  const fromApi = isApiError(update.error) ? update.error.fieldErrors : {};
  return (
    <form onSubmit={submit} noValidate className="space-y-2">
      <Field label="Comment" hint={markdownHint} error={errors.body ?? fromApi.body}>
        {(control) => (
          <TextArea
            {...control}
            rows={4}
            autoFocus
            maxLength={commentMaxLength}
            value={body}
            onChange={(event) => setBody(event.target.value)}
          />
        )}
      </Field>
      {asModerator && (
        <ReasonField
          label="Why you change this person’s comment"
          value={reason}
          onChange={setReason}
          error={errors.reason ?? fromApi.reason}
          placeholder="e.g. removed a phone number"
        />
      )}
      {update.isError && !fromApi.body && !fromApi.reason && (
        <ErrorPanel compact error={update.error} title="Not saved" />
      )}
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="primary" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save'}
        </Button>
        <Button size="sm" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

function DeleteCommentDialog({
  caseId,
  comment,
  asModerator,
  open,
  onClose,
}: {
  caseId: number;
  comment: CaseComment;
  asModerator: boolean;
  open: boolean;
  onClose: () => void;
}) {
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | undefined>();
  const remove = useDeleteComment(caseId);
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Delete this comment?"
      description={
        asModerator
          ? 'The comment keeps its place, marked as deleted. Its text goes to the audit log with your reason.'
          : 'The comment keeps its place, marked as deleted; its text is gone.'
      }
    >
      <form
        noValidate
        className="space-y-3"
        onSubmit={(event) => {
          event.preventDefault();
          const problem = asModerator ? reasonProblem(reason) : undefined;
          setError(problem);
          if (problem) return;
          remove.mutate(
            { id: comment.id, reason: asModerator ? reason.trim() : undefined },
            { onSuccess: onClose },
          );
        }}
      >
        {asModerator && (
          <ReasonField
            autoFocus
            label="Why you delete this person’s comment"
            value={reason}
            onChange={setReason}
            error={error}
          />
        )}
        {remove.isError && <ErrorPanel compact error={remove.error} title="Not deleted" />}
        <div className="flex justify-end gap-2">
          <Button size="sm" variant="ghost" onClick={onClose}>
            Keep it
          </Button>
          <Button type="submit" size="sm" variant="danger" disabled={remove.isPending}>
            {remove.isPending ? 'Deleting…' : 'Delete the comment'}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

function CommentItem({
  caseId,
  comment,
  viewer,
}: {
  caseId: number;
  comment: CaseComment;
  viewer: SessionUser | null | undefined;
}) {
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const own = viewer != null && viewer.id === comment.author.id;
  const moderator = hasRole(viewer, 'moderator');
  const mayChange = !comment.deleted && (own || moderator);

  return (
    <li className="flex gap-3 border-b border-line/70 px-3 py-2.5 last:border-b-0">
      <Avatar src="" login={comment.author.login} size={24} />
      <div className="min-w-0 flex-1">
        <div className="flex flex-wrap items-baseline gap-x-2 text-[13px]">
          <PersonName person={comment.author} />
          <time dateTime={comment.createdAt} className="font-mono text-xs text-ink-faint tabular">
            {formatDateTime(comment.createdAt)}
          </time>
          {comment.editedAt && !comment.deleted && (
            <span
              className="text-xs text-ink-faint"
              title={`Edited ${formatDateTime(comment.editedAt)}`}
            >
              edited
            </span>
          )}
          {mayChange && !editing && (
            <span className="ml-auto flex gap-1">
              <Button
                size="sm"
                variant="ghost"
                className="h-6 px-1.5 text-xs"
                onClick={() => setEditing(true)}
              >
                Edit
              </Button>
              <Button
                size="sm"
                variant="ghost"
                className="h-6 px-1.5 text-xs"
                onClick={() => setDeleting(true)}
              >
                Delete
              </Button>
            </span>
          )}
        </div>
        <div className="mt-1">
          {comment.deleted ? (
            <p className="text-[13px] text-ink-faint italic">This comment was deleted.</p>
          ) : editing ? (
            <CommentEditor
              caseId={caseId}
              comment={comment}
              asModerator={!own}
              onDone={() => setEditing(false)}
            />
          ) : (
            <CaseHtml html={comment.html} className="text-[13px]" />
          )}
        </div>
      </div>
      {mayChange && (
        <DeleteCommentDialog
          caseId={caseId}
          comment={comment}
          asModerator={!own}
          open={deleting}
          onClose={() => setDeleting(false)}
        />
      )}
    </li>
  );
}

function NewComment({ caseId }: { caseId: number }) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | undefined>();
  const add = useAddComment(caseId);
  const fromApi = isApiError(add.error) ? add.error.fieldErrors : {};
  return (
    <form
      noValidate
      className="space-y-2 px-3 py-2.5"
      onSubmit={(event) => {
        event.preventDefault();
        const problem = commentProblem(body);
        setError(problem);
        if (problem) return;
        add.mutate(body.trim(), { onSuccess: () => setBody('') });
      }}
    >
      <Field label="Add a comment" hint={markdownHint} error={error ?? fromApi.body}>
        {(control) => (
          <TextArea
            {...control}
            rows={3}
            maxLength={commentMaxLength}
            value={body}
            placeholder="A question, a reading from your board, what else you found…"
            onChange={(event) => {
              setBody(event.target.value);
              if (error) setError(undefined);
            }}
          />
        )}
      </Field>
      {add.isError && !fromApi.body && <ErrorPanel compact error={add.error} title="Not posted" />}
      <Button type="submit" size="sm" variant="primary" disabled={add.isPending}>
        {add.isPending ? 'Posting…' : 'Post the comment'}
      </Button>
    </form>
  );
}

type CaseCommentsProps = {
  caseId: number;
  published: boolean;
  viewer: SessionUser | null | undefined;
};

export function CaseComments({ caseId, published, viewer }: CaseCommentsProps) {
  const comments = useComments(caseId);
  const { pathname, search } = useLocation();
  const count = comments.data?.filter((comment) => !comment.deleted).length ?? 0;
  return (
    <section
      aria-labelledby="case-comments-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="case-comments-title" className="text-sm font-semibold">
          Comments
        </h2>
        {comments.data && <span className="text-xs text-ink-muted">{formatCount(count)}</span>}
      </header>
      {comments.isPending ? (
        <div aria-busy="true" className="m-3 h-12 animate-pulse rounded bg-raised">
          <span className="sr-only">Loading the comments…</span>
        </div>
      ) : comments.isError ? (
        <div className="p-3">
          <ErrorPanel
            compact
            error={comments.error}
            title="Could not load the comments"
            actions={
              <Button size="sm" onClick={() => void comments.refetch()}>
                Try again
              </Button>
            }
          />
        </div>
      ) : comments.data.length > 0 ? (
        <ol>
          {comments.data.map((comment) => (
            <CommentItem key={comment.id} caseId={caseId} comment={comment} viewer={viewer} />
          ))}
        </ol>
      ) : (
        <p className="px-3 py-2.5 text-[13px] text-ink-muted">No comments yet.</p>
      )}
      <div className="border-t border-line">
        {!published ? (
          <p className="px-3 py-2.5 text-[13px] text-ink-muted">
            Comments open once the case is published.
          </p>
        ) : viewer === null ? (
          <p className="px-3 py-2.5 text-[13px] text-ink-muted">
            <a
              href={paths.signIn.getHref(`${pathname}${search}`)}
              className="text-accent hover:underline"
            >
              Sign in
            </a>{' '}
            to comment.
          </p>
        ) : viewer ? (
          <NewComment caseId={caseId} />
        ) : null}
      </div>
    </section>
  );
}
