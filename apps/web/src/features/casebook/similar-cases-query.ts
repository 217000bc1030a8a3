// What the editor asks the API about while the case is being written, to show likely duplicates:
// the nets and parts picked so far and the title and symptom typed so far.
import type { CaseForm } from './case-form';

// The API's limits on the question (packages/shared/src/casebook.ts, similarCasesQuerySchema):
// lists of at most 50 names in at most 2,000 characters, text of at most 2,000 characters.
const listItems = 50;
const listChars = 2000;
const textChars = 2000;
/** Fewer letters than this match almost anything: not worth asking about yet. */
const shortestText = 4;

function commaList(names: readonly string[]): string {
  const unique = [...new Set(names.map((name) => name.trim()).filter((name) => name !== ''))];
  const kept: string[] = [];
  let length = 0;
  for (const name of unique.slice(0, listItems)) {
    // names with a comma cannot travel in a comma list; the API would split them
    if (name.includes(',')) continue;
    const added = (kept.length > 0 ? 1 : 0) + name.length;
    if (length + added > listChars) break;
    kept.push(name);
    length += added;
  }
  return kept.join(',');
}

export type SimilarCasesParams = Record<string, string>;

/** The query string of GET /boards/:slug/cases/similar, or null while there is nothing to compare. */
export function similarCasesParams(
  form: Pick<CaseForm, 'title' | 'symptom' | 'nets' | 'parts' | 'readings'>,
  exclude?: number,
): SimilarCasesParams | null {
  const params: SimilarCasesParams = {};
  const nets = commaList([...form.nets, ...form.readings.map((reading) => reading.net)]);
  const components = commaList(form.parts.map((part) => part.refdes));
  const text = [form.title.trim(), form.symptom.trim()]
    .filter((part) => part !== '')
    .join('\n')
    .slice(0, textChars)
    .trim();
  if (nets) params.nets = nets;
  if (components) params.components = components;
  if (text.length >= shortestText) params.text = text;
  if (Object.keys(params).length === 0) return null;
  if (exclude !== undefined) params.exclude = String(exclude);
  return params;
}
