// The one place the casebook inserts HTML into the page. It is only ever given the API's rendering
// of a Markdown field (the `html` fields of a case and of a comment): markdown-it with raw HTML off,
// then sanitize-html with an allow-list of tags, attributes and link schemes
// (apps/api/src/modules/casebook/case-markdown.ts). Never pass it anything else, text typed in this
// browser included.
import type { MouseEvent } from 'react';
import { useNavigate } from 'react-router-dom';

// Typography for the rendered Markdown, on the app's theme tokens.
const proseClass = [
  'text-sm leading-relaxed text-ink break-words',
  '[&_p]:my-2 [&>*:first-child]:mt-0 [&>*:last-child]:mb-0',
  '[&_ol]:my-2 [&_ol]:list-decimal [&_ol]:pl-5 [&_ul]:my-2 [&_ul]:list-disc [&_ul]:pl-5',
  '[&_li]:my-1 [&_li]:pl-0.5 [&_li::marker]:text-ink-faint',
  '[&_h1]:mt-4 [&_h1]:mb-1.5 [&_h1]:text-base [&_h1]:font-semibold',
  '[&_h2]:mt-4 [&_h2]:mb-1.5 [&_h2]:text-[15px] [&_h2]:font-semibold',
  '[&_h3]:mt-3 [&_h3]:mb-1 [&_h3]:text-sm [&_h3]:font-semibold',
  '[&_h4]:mt-3 [&_h4]:mb-1 [&_h4]:font-semibold',
  '[&_a]:text-accent [&_a]:underline-offset-2 [&_a:hover]:underline',
  '[&_a.net-link]:font-mono [&_a.net-link]:text-[0.93em] [&_a.part-link]:font-mono [&_a.part-link]:text-[0.93em]',
  '[&_code]:rounded [&_code]:bg-sunken [&_code]:px-1 [&_code]:py-px [&_code]:font-mono [&_code]:text-[0.9em]',
  '[&_pre]:my-2 [&_pre]:overflow-x-auto [&_pre]:rounded-md [&_pre]:border [&_pre]:border-line [&_pre]:bg-sunken [&_pre]:p-2.5',
  '[&_pre_code]:bg-transparent [&_pre_code]:p-0',
  '[&_blockquote]:my-2 [&_blockquote]:border-l-2 [&_blockquote]:border-line-strong [&_blockquote]:pl-3 [&_blockquote]:text-ink-muted',
  '[&_hr]:my-3 [&_hr]:border-line',
  '[&_table]:my-2 [&_table]:border-collapse [&_table]:text-[13px]',
  '[&_th]:border [&_th]:border-line [&_th]:bg-raised [&_th]:px-2 [&_th]:py-1 [&_th]:text-left [&_th]:font-medium',
  '[&_td]:border [&_td]:border-line [&_td]:px-2 [&_td]:py-1',
].join(' ');

type CaseHtmlProps = {
  /** sanitised HTML from the API, see the note at the top of this file */
  html: string;
  className?: string;
};

export function CaseHtml({ html, className }: CaseHtmlProps) {
  const navigate = useNavigate();

  // Net and part links point into this app: follow them without reloading the page.
  const followInside = (event: MouseEvent<HTMLDivElement>) => {
    if (event.defaultPrevented || event.button !== 0) return;
    if (event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return;
    const link = (event.target as Element).closest('a');
    if (!link || !event.currentTarget.contains(link) || link.target) return;
    const url = new URL(link.href, window.location.href);
    if (url.origin !== window.location.origin || url.pathname.startsWith('/api/')) return;
    event.preventDefault();
    void navigate(`${url.pathname}${url.search}${url.hash}`);
  };

  return (
    // The links inside are ordinary anchors with their own keyboard behaviour (Enter on a link
    // fires this click too); the handler only changes how a followed link is carried out.
    <div
      className={`${proseClass} ${className ?? ''}`}
      onClick={followInside}
      dangerouslySetInnerHTML={{ __html: html }}
    />
  );
}
