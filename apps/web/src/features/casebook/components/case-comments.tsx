// Comments under a case, in Markdown like the write-up. Everyone signed in comments on a published
// case that is not locked; people edit and delete their own; a moderator may edit, delete, hide or
// restore anyone's and says why (the audit log keeps it with the old text). Members report comments
// to the moderators; a hidden comment reaches only moderators and its author, dimmed, with the reason.
import type { CaseComment, SessionUser } from '@railyard/shared';
import { useEffect, useState, type FormEvent } from 'react';
import { useLocation } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Avatar } from '../../../components/ui/avatar';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, TextArea } from '../../../components/ui/field';
import { ReasonDialog } from '../../../components/ui/reason-dialog';
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
import { useModerateComment } from '../api/moderate-comment';
import { useUpdateComment } from '../api/update-comment';
import { commentMaxLength } from '../case-vocabulary';
import { CaseHtml } from './case-html';
import { PersonName } from './case-marks';
import { ReportButton } from './report-button';

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

function HideCommentDialog({
  caseId,
  comment,
  open,
  onClose,
}: {
  caseId: number;
  comment: CaseComment;
  open: boolean;
  onClose: () => void;
}) {
  const moderate = useModerateComment(caseId);
  const restoring = comment.hidden != null;
  const close = () => {
    moderate.reset();
    onClose();
  };
  return (
    <ReasonDialog
      open={open}
      onClose={close}
      title={restoring ? 'Restore this comment?' : 'Hide this comment?'}
      description={
        restoring
          ? 'Everyone reading the case sees it again.'
          : 'Only moderators and the person who wrote it will see it, with your reason. Nothing is deleted.'
      }
      reasonLabel={restoring ? 'Why you restore it' : 'Why you hide it (its author reads this)'}
      placeholder={
        restoring
          ? 'e.g. the link in it was checked and is fine'
          : 'e.g. advertises a repair service'
      }
      confirmLabel={restoring ? 'Restore the comment' : 'Hide the comment'}
      tone={restoring ? 'primary' : 'danger'}
      pending={moderate.isPending}
      error={moderate.error}
      onConfirm={(reason) =>
        moderate.mutate(
          { id: comment.id, action: restoring ? 'restore' : 'hide', reason },
          { onSuccess: close },
        )
      }
    />
  );
}

/** The anchor a link to one comment ends in; the moderation queue links to flagged comments by it. */
function commentAnchor(commentId: number): string {
  return `comment-${commentId}`;
}

function CommentItem({
  caseId,
  comment,
  locked,
  viewer,
  targeted,
}: {
  caseId: number;
  comment: CaseComment;
  locked: boolean;
  viewer: SessionUser | null | undefined;
  /** the address points at this comment */
  targeted: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [hiding, setHiding] = useState(false);
  const own = viewer != null && viewer.id === comment.author.id;
  const moderator = hasRole(viewer, 'moderator');
  // A locked case takes no edits from commenters; moderators still tidy its thread.
  const mayChange = !comment.deleted && (moderator || (own && !locked));
  const mayReport = viewer != null && !own && !comment.deleted && comment.hidden == null;
  const tools = 'h-6 px-1.5 text-xs';

  return (
    <li
      id={commentAnchor(comment.id)}
      className={`flex scroll-mt-16 gap-3 border-b border-line/70 px-3 py-2.5 last:border-b-0 ${targeted ? 'bg-accent-soft/40' : ''}`}
    >
      <div className={comment.hidden ? 'opacity-50' : ''}>
        <Avatar src="" login={comment.author.login} size={24} />
      </div>
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
          {!editing && (mayChange || mayReport) && (
            <span className="ml-auto flex gap-1">
              {mayChange && (
                <>
                  <Button
                    size="sm"
                    variant="ghost"
                    className={tools}
                    onClick={() => setEditing(true)}
                  >
                    Edit
                  </Button>
                  <Button
                    size="sm"
                    variant="ghost"
                    className={tools}
                    onClick={() => setDeleting(true)}
                  >
                    Delete
                  </Button>
                </>
              )}
              {moderator && !comment.deleted && (
                <Button size="sm" variant="ghost" className={tools} onClick={() => setHiding(true)}>
                  {comment.hidden ? 'Restore' : 'Hide'}
                </Button>
              )}
              {mayReport && (
                <ReportButton target={{ type: 'comment', id: comment.id }} className={tools} />
              )}
            </span>
          )}
        </div>
        {comment.hidden && !comment.deleted && (
          <p className="mt-1 text-xs text-danger">
            Hidden by a moderator on{' '}
            <time dateTime={comment.hidden.at} className="font-mono tabular">
              {formatDateTime(comment.hidden.at)}
            </time>
            {comment.hidden.reason ? `: ${comment.hidden.reason}` : ''}.{' '}
            <span className="text-ink-muted">
              {own
                ? 'Only you and the moderators see it.'
                : 'Only moderators and its author see it.'}
            </span>
          </p>
        )}
        <div className={`mt-1 ${comment.hidden && !editing ? 'opacity-60' : ''}`}>
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
      {moderator && !comment.deleted && (
        <HideCommentDialog
          caseId={caseId}
          comment={comment}
          open={hiding}
          onClose={() => setHiding(false)}
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
  locked: boolean;
  viewer: SessionUser | null | undefined;
};

export function CaseComments({ caseId, published, locked, viewer }: CaseCommentsProps) {
  const comments = useComments(caseId);
  const { pathname, search, hash } = useLocation();
  const shown = comments.data?.filter((comment) => !comment.deleted) ?? [];
  const hiddenCount = shown.filter((comment) => comment.hidden != null).length;
  const count = shown.length - hiddenCount;
  // The browser scrolls to #comment-N only if the comment is there at load; it arrives later.
  const loaded = comments.data !== undefined;
  useEffect(() => {
    if (!loaded || !hash.startsWith('#comment-')) return;
    const target = document.getElementById(hash.slice(1));
    if (!target) return;
    const follow = () => target.scrollIntoView({ block: 'start' });
    follow();
    // Sections above it (the attachments) may still be loading and push it down: keep it in view
    // for a moment, until the reader scrolls themselves.
    const resized = new ResizeObserver(follow);
    resized.observe(document.body);
    const stop = () => resized.disconnect();
    const timer = setTimeout(stop, 2000);
    const events = ['wheel', 'touchstart', 'keydown'] as const;
    for (const name of events) window.addEventListener(name, stop, { once: true });
    return () => {
      clearTimeout(timer);
      stop();
      for (const name of events) window.removeEventListener(name, stop);
    };
  }, [loaded, hash]);
  return (
    <section
      aria-labelledby="case-comments-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="case-comments-title" className="text-sm font-semibold">
          Comments
        </h2>
        {comments.data && (
          <span className="text-xs text-ink-muted">
            {formatCount(count)}
            {hiddenCount > 0 && ` · ${formatCount(hiddenCount)} hidden`}
          </span>
        )}
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
            <CommentItem
              key={comment.id}
              caseId={caseId}
              comment={comment}
              locked={locked}
              viewer={viewer}
              targeted={hash === `#${commentAnchor(comment.id)}`}
            />
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
        ) : locked ? (
          <p className="px-3 py-2.5 text-[13px] text-ink-muted">
            A moderator locked this case: it takes no new comments.
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
