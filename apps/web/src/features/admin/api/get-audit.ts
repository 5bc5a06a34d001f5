import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { auditPageSchema, type AuditPage, type AuditQueryInput } from "@plumeline/contracts";
import { api, buildUrl } from "@/lib/api-client";
import { compactQuery } from "@/lib/list-query";

export type AuditQuery = Omit<AuditQueryInput, "hideSignIns"> & { hideSignIns?: boolean };

const toQuery = (query: AuditQuery) => compactQuery({ ...query, hideSignIns: query.hideSignIns ? "true" : undefined });

export const getAudit = (query: AuditQuery, signal?: AbortSignal) =>
  api.get<AuditPage>("/api/audit", { query: toQuery(query), signal, schema: auditPageSchema });

export const getAuditQueryOptions = (query: AuditQuery) =>
  queryOptions({ queryKey: ["audit", toQuery(query)], queryFn: ({ signal }) => getAudit(query, signal), placeholderData: keepPreviousData });

export const useAudit = (query: AuditQuery) => useQuery(getAuditQueryOptions(query));

/** The same filters as a CSV download link (the file holds every matching row, not one page). */
export const auditCsvUrl = (query: AuditQuery) => {
  const { limit: _limit, offset: _offset, ...filters } = toQuery(query);
  return buildUrl("/api/audit.csv", filters);
};
