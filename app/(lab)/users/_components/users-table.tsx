"use client";

import { Notice } from "@/components/ui/notice";
import { UserRow } from "./user-row";
import { useUsers } from "./users-api";

export function UsersTable({ selfId }: { selfId: string }) {
  const users = useUsers();
  if (users.isPending) return <p className="text-ink-600">Loading users…</p>;
  if (users.isError) return <Notice tone="error">{users.error.message}</Notice>;
  return (
    <section className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left">
        <caption className="sr-only">All accounts</caption>
        <thead className="bg-ink-50 text-sm text-ink-600">
          <tr>
            <th scope="col" className="px-3 py-2">
              Person
            </th>
            <th scope="col" className="px-3 py-2">
              Roles
            </th>
            <th scope="col" className="px-3 py-2">
              Status
            </th>
            <th scope="col" className="px-3 py-2">
              Actions
            </th>
          </tr>
        </thead>
        <tbody>
          {users.data.map((u) => (
            <UserRow key={u.id} user={u} isSelf={u.id === selfId} />
          ))}
        </tbody>
      </table>
    </section>
  );
}
