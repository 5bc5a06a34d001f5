import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { auditPageSchema, type AuditPage } from "@plumeline/contracts";
import { api } from "@/lib/api-client";

export interface AuditFilter {
  action?: string;
  entityType?: string;
  entityId?: string;
  actorId?: string;
  from?: string;
  to?: string;
  limit: number;
  offset: number;
}

export const getAudit = (filter: AuditFilter, signal?: AbortSignal) =>
  api.get<AuditPage>("/api/audit", { query: { ...filter }, signal, schema: auditPageSchema });

export const getAuditQueryOptions = (filter: AuditFilter) =>
  queryOptions({ queryKey: ["audit", filter], queryFn: ({ signal }) => getAudit(filter, signal), placeholderData: keepPreviousData });

export const useAudit = (filter: AuditFilter) => useQuery(getAuditQueryOptions(filter));
