// A development tool: the mail this server sent, caught before it left. Open to anyone, as the API's
// mailbox is; the reader's own address, when they are signed in, is where the filter starts.
import { PageHeader } from '../../components/layout/page-header';
import { useSignedInUser } from '../../lib/viewer';
import { MailboxView } from '../../features/mailbox/components/mailbox-view';
import { useOwnEmail } from '../../features/notifications/api/get-notification-settings';

export default function MailboxRoute() {
  const user = useSignedInUser();
  const ownAddress = useOwnEmail(user === undefined ? undefined : (user?.id ?? null));
  return (
    <div className="mx-auto max-w-7xl px-4 py-5">
      <title>Mailbox · Railyard</title>
      <PageHeader
        title="Mailbox"
        description="The e-mail this development server sent, caught on its way out instead of delivered. It lives in the server’s memory: a restart empties it."
      />
      <MailboxView ownAddress={ownAddress} />
    </div>
  );
}
