import type { ImportIssue } from '@railyard/shared';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { formatCount } from '../../../lib/quantity-format';

// A file with a wrong column layout can fail on every line; the first rows tell the story.
const firstRows = 300;

type Props = { title: string; issues: ImportIssue[]; tone: 'danger' | 'caution' };

const tones = {
  danger: { heading: 'text-danger', frame: 'border-danger/40' },
  caution: { heading: 'text-caution', frame: 'border-caution/40' },
} as const;

/** Every problem the import found, where it is (file, line, field) and what it is. */
export function ImportIssuesTable({ title, issues, tone }: Props) {
  const [limit, setLimit] = useState(firstRows);
  if (issues.length === 0) return null;
  const shown = issues.slice(0, limit);
  const th = 'h-7 px-2.5 text-left text-xs font-medium text-ink-muted';
  const td = 'px-2.5 py-1 align-baseline';
  return (
    <section className={`overflow-hidden rounded-md border bg-surface ${tones[tone].frame}`}>
      <h3 className={`border-b border-line px-3 py-2 text-sm font-semibold ${tones[tone].heading}`}>
        {title}{' '}
        <span className="font-mono font-normal tabular">({formatCount(issues.length)})</span>
      </h3>
      <div className="max-h-[28rem] overflow-auto">
        <table className="w-full border-collapse text-[13px]">
          <thead className="sticky top-0 bg-raised">
            <tr>
              <th scope="col" className={th}>
                File
              </th>
              <th scope="col" className={`${th} text-right`}>
                Line
              </th>
              <th scope="col" className={th}>
                Field
              </th>
              <th scope="col" className={th}>
                Message
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((issue, index) => (
              <tr key={index} className="border-t border-line/70">
                <td className={`${td} font-mono text-xs whitespace-nowrap text-ink-muted`}>
                  {issue.file ?? ''}
                </td>
                <td className={`${td} text-right font-mono tabular`}>{issue.line ?? ''}</td>
                <td className={`${td} font-mono text-xs`}>{issue.field ?? ''}</td>
                <td className={td}>{issue.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {issues.length > shown.length && (
          <div className="flex items-center gap-3 border-t border-line px-3 py-2 text-[13px] text-ink-muted">
            <span>
              {formatCount(shown.length)} of {formatCount(issues.length)}
            </span>
            <Button size="sm" onClick={() => setLimit(issues.length)}>
              Show all
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}
