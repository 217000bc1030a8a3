// Sign-in leaves the app: GitHub (or the local fake) and back. It is a plain link, so the browser
// makes a top-level navigation the server can redirect, and the way back is the page it came from.
import type { ReactNode } from 'react';
import { useLocation } from 'react-router-dom';
import { buttonClass } from '../../../components/ui/button';
import { paths } from '../../../config/paths';

/** The query parameter the server's sign-in failures come back with (`/?signin=failed`). */
export const signInNoticeParam = 'signin';

/** The current page as a path to come back to, without a sign-in notice that was on it. */
export function useReturnTo(): string {
  const { pathname, search, hash } = useLocation();
  const params = new URLSearchParams(search);
  params.delete(signInNoticeParam);
  const query = params.toString();
  return `${pathname}${query ? `?${query}` : ''}${hash}`;
}

type SignInLinkProps = {
  children?: ReactNode;
  variant?: 'primary' | 'secondary' | 'ghost';
  className?: string;
};

export function SignInLink({
  children = 'Sign in',
  variant = 'primary',
  className,
}: SignInLinkProps) {
  const returnTo = useReturnTo();
  return (
    <a
      href={paths.signIn.getHref(returnTo)}
      className={`${buttonClass(variant, 'sm')} ${className ?? ''}`}
    >
      {children}
    </a>
  );
}
