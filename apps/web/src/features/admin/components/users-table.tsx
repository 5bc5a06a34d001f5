import type { User } from "@plumeline/contracts";
import { InlineError } from "@/components/ui/states";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";
import { useChangeUserRole } from "../api/save-user";
import { useSetUserStatus } from "../api/set-user-status";
import { RoleChange } from "./role-change";
import { UserStatusAction, UserStatusBadge } from "./user-status";

export function UsersTable({ users, currentUserId }: { users: User[]; currentUserId: string }) {
  const change = useChangeUserRole();
  const status = useSetUserStatus();
  return (
    <>
      <Table>
        <thead>
          <tr>
            <Th>Name</Th>
            <Th>Email</Th>
            <Th>Role</Th>
            <Th>Since</Th>
            <Th>Status</Th>
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          </tr>
        </thead>
        <tbody>
          {users.map((u) => (
            <tr key={u.id}>
              <Td className="font-medium">{u.name}</Td>
              <Td className="text-muted">{u.email}</Td>
              <Td>
                <RoleChange
                  user={u}
                  isSelf={u.id === currentUserId}
                  saving={change.isPending && change.variables?.id === u.id}
                  error={change.variables?.id === u.id ? change.error : null}
                  onConfirm={({ role, reason }) => change.mutateAsync({ id: u.id, role, reason })}
                />
              </Td>
              <Td className="text-muted">{formatDate(u.createdAt)}</Td>
              <Td>
                <UserStatusBadge deactivated={u.deactivated} />
              </Td>
              <Td>
                <UserStatusAction
                  user={u}
                  isSelf={u.id === currentUserId}
                  saving={status.isPending && status.variables?.id === u.id}
                  onSetStatus={(deactivated) => status.mutate({ id: u.id, deactivated })}
                />
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <InlineError error={status.error} />
    </>
  );
}
