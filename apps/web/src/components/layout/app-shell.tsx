import { Suspense, type ReactNode } from 'react';
import {
  Form,
  Link,
  NavLink,
  Outlet,
  ScrollRestoration,
  useLocation,
  useNavigation,
} from 'react-router-dom';
import { paths } from '../../config/paths';
import { PageLoading } from './page-loading';
import { ThemeToggle } from './theme-toggle';
import { Wordmark } from './wordmark';

function navClass(isActive: boolean) {
  return `rounded-md px-2.5 py-1 text-[13px] font-medium ${
    isActive ? 'bg-raised text-ink' : 'text-ink-muted hover:text-ink'
  }`;
}

/** Rail search over all boards; submitting opens the search page with the text as ?q=. */
function TopSearch() {
  return (
    <Form role="search" action={paths.search.path} className="hidden sm:block">
      <label htmlFor="top-search" className="sr-only">
        Search rails on all boards
      </label>
      <input
        id="top-search"
        name="q"
        type="search"
        required
        maxLength={100}
        autoComplete="off"
        spellCheck={false}
        placeholder="Search rails on all boards"
        className="h-7.5 w-56 rounded-md border border-line bg-field px-2.5 font-mono text-[13px] text-ink placeholder:font-sans placeholder:text-ink-faint hover:border-line-strong focus-visible:border-accent"
      />
    </Form>
  );
}

type AppShellProps = {
  /** the account corner of the top bar: sign-in, or who is signed in */
  account?: ReactNode;
  /** a notice across the top of every page, e.g. why a sign-in did not work */
  notice?: ReactNode;
  /** whether the top bar offers "Import" (only roles that may import see it) */
  canImport?: boolean;
};

export function AppShell({ account, notice, canImport = false }: AppShellProps) {
  const navigation = useNavigation();
  const { pathname } = useLocation();
  // The home page is the board list, so "Boards" is lit there too.
  const onBoards = pathname === paths.home.path;
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded bg-accent px-3 py-1.5 text-accent-ink focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="sticky top-0 z-30 border-b border-line bg-surface/95 backdrop-blur">
        <div className="flex h-11 items-center gap-4 px-4">
          <Link to={paths.home.getHref()} aria-label="Railyard, all boards" className="rounded">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="flex items-center gap-1">
            <NavLink
              to={paths.boards.getHref()}
              className={({ isActive }) => navClass(isActive || onBoards)}
            >
              Boards
            </NavLink>
            {canImport && (
              <NavLink
                to={paths.newBoardImport.getHref()}
                className={({ isActive }) => navClass(isActive)}
              >
                Import
              </NavLink>
            )}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            {/* The search page has its own, larger field. */}
            {pathname !== paths.search.path && <TopSearch />}
            <ThemeToggle />
            {account}
          </div>
        </div>
        {navigation.state !== 'idle' && (
          <div className="absolute inset-x-0 -bottom-px h-0.5 overflow-hidden" role="presentation">
            <div className="animate-sweep h-full w-1/3 bg-accent" />
          </div>
        )}
      </header>
      {notice}
      <main id="main" className="flex-1" tabIndex={-1}>
        <Suspense fallback={<PageLoading />}>
          <Outlet />
        </Suspense>
      </main>
      <ScrollRestoration />
    </div>
  );
}
