// While a case is written, the board's cases that look like it: same nets, the same culprit, alike
// words. Seeing one before saving saves writing a known fix up twice; it may also be the answer.
import type { SimilarCase } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useSimilarCases } from '../api/get-similar-cases';
import { useSettled } from '../hooks/use-settled';
import type { SimilarCasesParams } from '../similar-cases-query';
import { ScoreLine } from './case-marks';
import { OutcomeBadge } from './outcome-badge';

const typingPause = 500;

function reasons(found: SimilarCase): string[] {
  const why: string[] = [];
  if (found.why.culprits.length > 0) {
    why.push(`${found.why.culprits.join(', ')} was the culprit there`);
  }
  if (found.why.nets.length > 0) why.push(`also on ${found.why.nets.join(', ')}`);
  if (found.why.text !== null && found.why.text > 0) {
    why.push(`words ${Math.round(Math.min(1, found.why.text) * 100)} % alike`);
  }
  return why;
}

type LikelyDuplicatesProps = { slug: string; params: SimilarCasesParams | null };

export function LikelyDuplicates({ slug, params }: LikelyDuplicatesProps) {
  const settled = useSettled(params, typingPause);
  const similar = useSimilarCases(slug, settled);
  const cases = settled ? (similar.data?.cases ?? []) : [];
  return (
    <aside
      aria-labelledby="likely-duplicates-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="likely-duplicates-title" className="text-sm font-semibold">
          Already written up?
        </h2>
        {settled && similar.isFetching && <span className="text-xs text-ink-faint">looking…</span>}
      </header>
      <div aria-live="polite" className="text-[13px]">
        {!settled ? (
          <p className="px-3 py-2.5 text-ink-muted">
            Pick nets and parts or type the title: cases of this board that look like this one show
            here before you save.
          </p>
        ) : similar.isError ? (
          <p className="px-3 py-2.5 text-danger">
            Could not look for similar cases: {similar.error.message}
          </p>
        ) : !similar.data ? (
          <p className="px-3 py-2.5 text-ink-muted">Looking for similar cases…</p>
        ) : cases.length === 0 ? (
          <p className="px-3 py-2.5 text-ink-muted">No case of this board looks like this one.</p>
        ) : (
          <>
            <p className="px-3 pt-2.5 text-xs text-ink-muted">
              {cases.length === 1 ? 'This case looks' : `These ${cases.length} cases look`} like
              yours. If one is the same fault, confirm or comment there instead. Links open in a new
              tab.
            </p>
            <ol className={`py-1 ${similar.isPlaceholderData ? 'opacity-60' : ''}`}>
              {cases.map((found) => (
                <li key={found.id} className="border-b border-line/60 px-3 py-2 last:border-b-0">
                  <Link
                    to={paths.case.getHref(found.id)}
                    target="_blank"
                    rel="noopener"
                    className="font-medium text-ink hover:text-accent hover:underline"
                  >
                    {found.title}
                  </Link>
                  <div className="mt-1 flex flex-wrap items-center gap-x-2.5 gap-y-1">
                    <OutcomeBadge outcome={found.outcome} />
                    <ScoreLine score={found.score} />
                  </div>
                  <ul className="mt-1 space-y-0.5 text-xs text-ink-muted">
                    {reasons(found).map((reason) => (
                      <li key={reason}>{reason}</li>
                    ))}
                  </ul>
                </li>
              ))}
            </ol>
          </>
        )}
      </div>
    </aside>
  );
}
