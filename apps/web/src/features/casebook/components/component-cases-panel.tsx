// On a part's page: the write-ups that name the part, culprit or not, best rated first. A part that
// keeps turning up as the culprit on one board is worth checking first on the next one.
import { paths } from '../../../config/paths';
import { useComponentCases } from '../api/get-component-cases';
import { CaseRow } from './case-row';
import { LinkedCasesPanel } from './linked-cases-panel';

/** how many cases the panel lists; a route prefetching them asks for the same page */
export const componentCasesShown = 8;

export function ComponentCasesPanel({ slug, refdes }: { slug: string; refdes: string }) {
  const cases = useComponentCases(slug, refdes, componentCasesShown);
  const shownRefdes = cases.data?.refdes ?? refdes;
  return (
    <LinkedCasesPanel
      titleId="component-cases-title"
      title="Cases naming this part"
      cases={cases}
      subject={shownRefdes}
      relation="naming"
      allCasesHref={paths.boardCases.getHref(slug, { component: shownRefdes })}
      renderCase={(summary) => <CaseRow key={summary.id} slug={slug} summary={summary} />}
    />
  );
}
