import type { Metadata } from "next";
import { RoleForm } from "@/components/admin/role-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { listUsers } from "@/lib/accounts/queries";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Accounts and roles" };

export default async function AdminUsersPage() {
  const me = await requirePageUser("admin:users", "/admin/users");
  const users = await listUsers();
  return (
    <PageShell>
      <PageHeader title="Accounts and roles" lead="A role decides which areas an account can open. Changes apply on the account's next page load." />
      <Table caption="Accounts">
        <THead>
          <Tr>
            <Th>Name</Th>
            <Th>E-mail</Th>
            <Th>Role</Th>
          </Tr>
        </THead>
        <TBody>
          {users.map((u) => (
            <Tr key={u.id}>
              <Td>{u.name}</Td>
              <Td>{u.email}</Td>
              <Td>
                <RoleForm userId={u.id} role={u.role} name={u.name} isSelf={u.id === me.id} />
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
    </PageShell>
  );
}
