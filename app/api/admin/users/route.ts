import { listUsers } from "@/lib/accounts/queries";
import { route } from "@/lib/http/route";


// Admin only: the accounts and their roles.
export const GET = route({ permission: "admin:users" }, async () => {
  const users = await listUsers();
  return { items: users.map((u) => ({ id: u.id, email: u.email, name: u.name, role: u.role })), total: users.length };
});
