"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { OrganisationInput } from "@/lib/organisations/schema";
import type { OrganisationRow } from "@/lib/organisations/service";

const ORGANISATIONS = ["organisations"] as const;

export function useOrganisationList() {
  return useQuery({
    queryKey: ORGANISATIONS,
    queryFn: () => fetchJson<{ organisations: OrganisationRow[] }>("/api/organisations").then((r) => r.organisations),
  });
}

export function useSaveOrganisation(id: string | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganisationInput) =>
      fetchJson<{ organisation: OrganisationRow }>(id ? `/api/organisations/${id}` : "/api/organisations", { method: id ? "PATCH" : "POST", body: input }).then(
        (r) => r.organisation,
      ),
    onSuccess: () => qc.invalidateQueries({ queryKey: ORGANISATIONS }),
  });
}
