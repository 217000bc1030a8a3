import { useLocation } from 'react-router-dom';
import { LinkButton } from '../../components/ui/button';
import { paths } from '../../config/paths';

export default function NotFoundRoute() {
  const { pathname } = useLocation();
  return (
    <div className="mx-auto max-w-xl px-4 py-16 text-center">
      <title>Not found · Railyard</title>
      <p className="font-mono text-sm text-ink-faint">404</p>
      <h1 className="mt-1 text-lg font-semibold">No page here</h1>
      <p className="mt-2 text-sm text-ink-muted">
        Nothing in Railyard lives at <code className="text-ink">{pathname}</code>.
      </p>
      <LinkButton variant="primary" className="mt-5" to={paths.boards.getHref()}>
        All boards
      </LinkButton>
    </div>
  );
}
