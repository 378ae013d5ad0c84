"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { InviteInput, UserUpdate } from "@/lib/users/schema";
import type { UserView } from "@/lib/users/view";

const USERS = ["users"] as const;

export function useUsers() {
  return useQuery({ queryKey: USERS, queryFn: () => fetchJson<{ users: UserView[] }>("/api/users").then((r) => r.users) });
}

export function useInvite() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => fetchJson<{ user: UserView }>("/api/users", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: USERS }),
  });
}

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: UserUpdate }) => fetchJson<{ user: UserView }>(`/api/users/${id}`, { method: "PATCH", body: change }),
    onSuccess: () => qc.invalidateQueries({ queryKey: USERS }),
  });
}

export function useReinvite() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<{ user: UserView }>(`/api/users/${id}/invite`, { method: "POST" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: USERS }),
  });
}
