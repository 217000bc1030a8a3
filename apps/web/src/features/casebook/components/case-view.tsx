// One case as the next technician reads it: symptom, readings against a known-good board, root
// cause and fix, the parts and nets involved, then what peers made of it.
import type { CaseDetail, SessionUser } from '@railyard/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { SectionErrorBoundary } from '../../../components/errors/error-boundary';
import { LinkButton } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { hasRole } from '../../../lib/roles';
import { formatMinutes } from '../time-spent';
import { CaseAttachments } from './case-attachments';
import { CaseComments } from './case-comments';
import { CaseHtml } from './case-html';
import { CulpritGlyph, NetChip, PersonName } from './case-marks';
import { CaseModeratorPanel, CaseStateBanners } from './case-moderation';
import { CaseScorePanel } from './case-score-panel';
import { MergedFromLine, MergedNotices } from './merged-notices';
import { OutcomeBadge, StatusBadge } from './outcome-badge';
import { ReadingsTable } from './readings-table';
import { ReportButton } from './report-button';

const labelClass = 'text-[11px] font-medium tracking-wider text-ink-faint uppercase';

function Panel({
  id,
  title,
  aside,
  children,
}: {
  id: string;
  title: string;
  aside?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="rounded-md border border-line bg-surface">
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id={id} className="text-sm font-semibold">
          {title}
        </h2>
        {aside}
      </header>
      {children}
    </section>
  );
}

function Written({ html, empty }: { html: string; empty: string }) {
  if (html.trim() === '') return <p className="px-3 py-2.5 text-[13px] text-ink-faint">{empty}</p>;
  return <CaseHtml html={html} className="px-3 py-2.5" />;
}

function PartsAndNets({ detail }: { detail: CaseDetail }) {
  const slug = detail.board.slug;
  return (
    <Panel id="case-links-title" title="On the board">
      <div className="space-y-3 px-3 py-2.5 text-[13px]">
        <div>
          <h3 className={labelClass}>Parts</h3>
          {detail.components.length === 0 ? (
            <p className="mt-1 text-ink-faint">No part named.</p>
          ) : (
            <ul className="mt-1 space-y-0.5">
              {detail.components.map((part) => (
                <li key={part.refdes} className="flex items-center gap-2">
                  <Link
                    to={paths.boardCases.getHref(slug, { component: part.refdes })}
                    title={`Every case on this board that names ${part.refdes}`}
                    className={`font-mono hover:underline ${part.culprit ? 'font-medium text-danger' : 'text-ink hover:text-accent'}`}
                  >
                    {part.refdes}
                  </Link>
                  {part.culprit && (
                    <span className="inline-flex items-center gap-1 rounded border border-danger/45 bg-danger-soft px-1 text-[11px] leading-4 text-danger">
                      <CulpritGlyph size={9} /> culprit
                    </span>
                  )}
                </li>
              ))}
            </ul>
          )}
        </div>
        <div>
          <h3 className={labelClass}>Nets</h3>
          {detail.nets.length === 0 ? (
            <p className="mt-1 text-ink-faint">No net named.</p>
          ) : (
            <ul className="mt-1 flex flex-wrap gap-1">
              {detail.nets.map((net) => (
                <li key={net} className="max-w-full">
                  <NetChip slug={slug} net={net} />
                </li>
              ))}
            </ul>
          )}
        </div>
      </div>
    </Panel>
  );
}

type CaseViewProps = { detail: CaseDetail; viewer: SessionUser | null | undefined };

export function CaseView({ detail, viewer }: CaseViewProps) {
  const slug = detail.board.slug;
  const own = viewer != null && viewer.id === detail.author.id;
  const published = detail.status === 'published';
  const edited = detail.updatedAt !== (detail.publishedAt ?? detail.createdAt);
  const locked = detail.moderation?.lockedAt != null;
  const moderator = hasRole(viewer, 'moderator');

  return (
    <>
      <section aria-labelledby="case-title" className="border-b border-line bg-surface px-4 py-3">
        <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
          <div className="min-w-0 flex-1">
            <p className="text-[13px] text-ink-muted">
              <Link to={paths.board.getHref(slug)} className="hover:text-accent hover:underline">
                {detail.board.title}
              </Link>
              <span className="mx-1.5 text-ink-faint" aria-hidden="true">
                /
              </span>
              <Link
                to={paths.boardCases.getHref(slug)}
                className="hover:text-accent hover:underline"
              >
                cases
              </Link>
            </p>
            <h1 id="case-title" className="mt-0.5 text-xl leading-tight font-semibold">
              {detail.title}
            </h1>
            <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 text-[13px] text-ink-muted">
              <OutcomeBadge outcome={detail.outcome} />
              <StatusBadge status={detail.status} />
              <span>
                by <PersonName person={detail.author} />{' '}
                <span
                  className="font-mono text-xs text-ink-faint tabular"
                  title="Reputation: what others’ votes and confirmations on this person’s cases add up to"
                >
                  ({formatCount(detail.author.reputation)})
                </span>
              </span>
              <span>
                {published ? 'published' : 'started'}{' '}
                <time
                  dateTime={detail.publishedAt ?? detail.createdAt}
                  className="font-mono text-ink tabular"
                >
                  {formatDateTime(detail.publishedAt ?? detail.createdAt).slice(0, 10)}
                </time>
              </span>
              {edited && (
                <Link
                  to={paths.caseHistory.getHref(detail.id)}
                  className="hover:text-accent hover:underline"
                >
                  edited{' '}
                  <time dateTime={detail.updatedAt} className="font-mono tabular">
                    {formatDateTime(detail.updatedAt).slice(0, 10)}
                  </time>
                </Link>
              )}
              {detail.minutesSpent !== null && (
                <span>
                  took <span className="text-ink">{formatMinutes(detail.minutesSpent)}</span>
                </span>
              )}
            </div>
            <MergedFromLine detail={detail} />
          </div>
          <div className="flex gap-2">
            <LinkButton size="sm" variant="ghost" to={paths.caseHistory.getHref(detail.id)}>
              History
            </LinkButton>
            {viewer && !own && published && (
              <ReportButton target={{ type: 'case', id: detail.id }} />
            )}
            {own && !locked && (
              <LinkButton
                size="sm"
                variant={published ? 'secondary' : 'primary'}
                to={paths.editCase.getHref(detail.id)}
              >
                {published ? 'Edit' : 'Edit and publish'}
              </LinkButton>
            )}
          </div>
        </div>
      </section>
      <MergedNotices detail={detail} />
      <CaseStateBanners detail={detail} />

      <div className="grid items-start gap-3 px-4 pt-3 pb-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-3">
          <Panel id="case-symptom-title" title="Symptom">
            <p className="px-3 py-2.5 text-sm whitespace-pre-line">{detail.symptom}</p>
          </Panel>
          {detail.readings.length > 0 && (
            <Panel
              id="case-readings-title"
              title="Readings"
              aside={
                <span className="text-xs text-ink-muted">
                  against a known-good board of the same board number
                </span>
              }
            >
              <ReadingsTable slug={slug} readings={detail.readings} />
            </Panel>
          )}
          <Panel id="case-cause-title" title="Root cause">
            <Written html={detail.html.rootCause} empty="Not written down." />
          </Panel>
          <Panel id="case-fix-title" title="Fix">
            <Written html={detail.html.fixSteps} empty="No steps written down." />
          </Panel>
          {detail.html.body.trim() !== '' && (
            <Panel id="case-body-title" title="Notes">
              <Written html={detail.html.body} empty="" />
            </Panel>
          )}
          <SectionErrorBoundary title="Could not show the attachments" resetKeys={[detail.id]}>
            <CaseAttachments caseId={detail.id} authorId={detail.author.id} viewer={viewer} />
          </SectionErrorBoundary>
          <SectionErrorBoundary title="Could not show the comments" resetKeys={[detail.id]}>
            <CaseComments
              caseId={detail.id}
              published={published}
              locked={locked}
              viewer={viewer}
            />
          </SectionErrorBoundary>
        </div>
        <div className="space-y-3 xl:sticky xl:top-14">
          {moderator && <CaseModeratorPanel detail={detail} />}
          <CaseScorePanel detail={detail} viewer={viewer} />
          <PartsAndNets detail={detail} />
        </div>
      </div>
    </>
  );
}
