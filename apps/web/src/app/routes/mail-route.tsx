import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMailList } from '../../features/mail/api/list-mail';
import { MailListView } from '../../features/mail/components/mail-list';

/** `/admin/mail`: what the local capture SMTP server received (administrators only). */
export function MailRoute() {
  const me = useMe();
  const crumbs = [{ label: 'Missions', to: '/missions' }, { label: 'Mail' }];
  if (me.data && me.data.role !== 'admin') {
    return (
      <>
        <title>Mail · Photon Ledger</title>
        <Breadcrumbs items={crumbs} />
        <NotFound title="Administrators only" message="The captured mail is for administrators." />
      </>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <title>Mail · Photon Ledger</title>
      <Breadcrumbs items={crumbs} />
      <div>
        <h1 className="text-2xl font-semibold">Captured mail</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Notifications the local capture SMTP server received, newest first. In production PL_SMTP_URL points at a real relay and this list stays empty.
        </p>
      </div>
      {me.data ? <MailBody /> : <LoadingState label="Loading…" />}
    </div>
  );
}

function MailBody() {
  const mail = useMailList();
  if (mail.isError) return <ErrorState title="Could not load the captured mail" error={mail.error} onRetry={() => void mail.refetch()} retrying={mail.isFetching} />;
  if (!mail.data) return <LoadingState label="Loading the captured mail…" />;
  return <MailListView messages={mail.data.messages} />;
}
