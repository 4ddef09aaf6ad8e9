/** /admin — accounts and roles, and the mail the development server caught. Each part answers 403 on its own for those without the right. */
import { useUsers } from '@/features/admin/api/admin';
import { UsersTable } from '@/features/admin/components/users-table';
import { MailBox } from '@/features/admin/components/mail-box';
import { useMe } from '@/features/auth/api/get-me';
import { PageHeader, Panel } from '@/components/panel';
import { QueryState } from '@/components/query-state';

export function AdminPage() {
  const users = useUsers();
  const me = useMe();
  return (
    <div className="flex max-w-6xl flex-col gap-3">
      <PageHeader title="Administration" facts={<span>Global roles apply in every project an account joins; a project can give its own role.</span>} />
      <Panel title="Accounts" count={users.data?.length}>
        <QueryState q={users} what="the accounts">{(list) => <UsersTable users={list} meId={me.data?.user.id} />}</QueryState>
      </Panel>
      <Panel title="Captured mail"><MailBox /></Panel>
    </div>
  );
}
