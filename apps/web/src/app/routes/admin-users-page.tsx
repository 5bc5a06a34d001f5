import { useMe } from "@/features/auth/api/get-me";
import { useUsers } from "@/features/admin/api/get-users";
import { AdminTabs } from "@/features/admin/components/admin-tabs";
import { InviteUserForm } from "@/features/admin/components/invite-user-form";
import { UsersTable } from "@/features/admin/components/users-table";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function AdminUsersPage() {
  const me = useMe();
  const users = useUsers();
  return (
    <>
      <PageHeader kicker="Admin" title="Users and roles" description="Analysts build, actuaries apply, managers approve, admins administer. One role per person." />
      <AdminTabs permissions={me.data?.permissions ?? []} />
      <Card className="mb-6">
        <CardHeader title="Invite someone" subtitle="They receive a mail with a one-time link to choose their password. No password is ever mailed." />
        <CardBody>
          <InviteUserForm />
        </CardBody>
      </Card>
      <Card>
        {users.isPending ? (
          <LoadingState />
        ) : users.isError ? (
          <div className="p-4">
            <ErrorState error={users.error} />
          </div>
        ) : (
          <UsersTable users={users.data} currentUserId={me.data?.user.id ?? ""} />
        )}
      </Card>
    </>
  );
}
