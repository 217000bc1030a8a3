// On a net's page: the write-ups of repairs on this rail, best rated first, and the parts that were
// at fault in the solved ones, which are the parts to suspect first.
import type { CaseSummary } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useSignedInUser } from '../../../lib/viewer';
import { useNetCases } from '../api/get-net-cases';
import { culpritTally } from '../culprit-tally';
import { CulpritChip, ScoreLine } from './case-marks';
import { LinkedCasesPanel } from './linked-cases-panel';
import { OutcomeBadge } from './outcome-badge';

const shownCases = 5;

function CulpritsWhenSolved({ cases }: { cases: CaseSummary[] }) {
  const culprits = culpritTally(cases);
  if (culprits.length === 0) return null;
  return (
    <div className="flex flex-wrap items-center gap-1.5 border-b border-line/70 px-3 py-2 text-xs text-ink-muted">
      <span>At fault when solved:</span>
      {culprits.map(({ refdes, cases: count }) => (
        <CulpritChip
          key={refdes}
          refdes={count > 1 ? `${refdes} ×${count}` : refdes}
          title={`${refdes} was the culprit in ${count} solved ${count === 1 ? 'case' : 'cases'} listed here`}
        />
      ))}
    </div>
  );
}

// Shorter than the case lists' rows: on the net's page the panel sits in the narrow side column.
function NetCaseRow({ summary }: { summary: CaseSummary }) {
  return (
    <li className="border-b border-line/70 px-3 py-2 last:border-b-0">
      <Link
        to={paths.case.getHref(summary.id)}
        className="text-[13px] font-medium text-ink hover:text-accent hover:underline"
      >
        {summary.title}
      </Link>
      <div className="mt-1 flex flex-wrap items-center gap-x-2.5 gap-y-1">
        <OutcomeBadge outcome={summary.outcome} />
        <ScoreLine score={summary.score} />
      </div>
    </li>
  );
}

export function NetCasesPanel({ slug, net }: { slug: string; net: string }) {
  const cases = useNetCases(slug, net, shownCases);
  const viewer = useSignedInUser();
  const shownNet = cases.data?.net ?? net;
  return (
    <LinkedCasesPanel
      titleId="net-cases-title"
      title="Cases on this rail"
      cases={cases}
      subject={shownNet}
      relation="on"
      allCasesHref={paths.boardCases.getHref(slug, { net: shownNet })}
      headerAction={
        viewer && (
          <Link
            to={paths.newCase.getHref(slug, { net })}
            className="ml-auto text-xs text-accent hover:underline"
          >
            Write one up
          </Link>
        )
      }
      aboveList={cases.data && <CulpritsWhenSolved cases={cases.data.cases} />}
      renderCase={(summary) => <NetCaseRow key={summary.id} summary={summary} />}
    />
  );
}
