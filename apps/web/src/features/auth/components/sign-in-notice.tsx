// The server sends a sign-in that did not work back to /?signin=failed or /?signin=banned.
// The notice says what happened; closing it takes the parameter out of the address.
import { useSearchParams } from 'react-router-dom';
import { SignInLink, signInNoticeParam } from './sign-in-link';
import { CrossGlyph } from '../../../components/ui/glyph';

const notices = {
  failed: {
    title: 'Sign-in did not complete',
    text: 'GitHub did not confirm who you are, or the sign-in was cancelled. You are still signed out; try again.',
    retry: true,
  },
  banned: {
    title: 'This account is banned',
    text: 'An administrator has banned this GitHub account from signing in to Railyard. Boards and rails stay readable without signing in.',
    retry: false,
  },
} as const;

function isNotice(value: string | null): value is keyof typeof notices {
  return value === 'failed' || value === 'banned';
}

export function SignInNotice() {
  const [searchParams, setSearchParams] = useSearchParams();
  const which = searchParams.get(signInNoticeParam);
  if (!isNotice(which)) return null;
  const notice = notices[which];
  const dismiss = () =>
    setSearchParams(
      (params) => {
        const next = new URLSearchParams(params);
        next.delete(signInNoticeParam);
        return next;
      },
      { replace: true, preventScrollReset: true },
    );
  return (
    <div
      role="alert"
      className="flex flex-wrap items-start gap-x-4 gap-y-2 border-b border-danger/40 bg-danger-soft px-4 py-2.5 text-[13px]"
    >
      <div className="min-w-0 flex-1">
        <p className="font-semibold text-danger">{notice.title}</p>
        <p className="mt-0.5 text-ink">{notice.text}</p>
      </div>
      <div className="flex items-center gap-2">
        {notice.retry && <SignInLink variant="secondary">Try again</SignInLink>}
        <button
          type="button"
          onClick={dismiss}
          aria-label="Dismiss the sign-in notice"
          title="Dismiss"
          className="inline-grid size-7 place-items-center rounded-md text-ink-muted hover:bg-raised hover:text-ink"
        >
          <CrossGlyph size={12} />
        </button>
      </div>
    </div>
  );
}
