import { queryOptions, useQuery } from "@tanstack/react-query";
import { outboxMessageSchema, outboxMessageSummarySchema, type OutboxMessage, type OutboxMessageSummary } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

export const getOutbox = (signal?: AbortSignal) =>
  api.get<OutboxMessageSummary[]>("/api/outbox", { signal, schema: z.array(outboxMessageSummarySchema) });

export const getOutboxQueryOptions = () => queryOptions({ queryKey: ["outbox", "list"], queryFn: ({ signal }) => getOutbox(signal) });

export const useOutbox = () => useQuery(getOutboxQueryOptions());

export const getOutboxMessage = (id: string, signal?: AbortSignal) =>
  api.get<OutboxMessage>(`/api/outbox/${encodeURIComponent(id)}`, { signal, schema: outboxMessageSchema });

export const getOutboxMessageQueryOptions = (id: string) =>
  queryOptions({ queryKey: ["outbox", "detail", id], queryFn: ({ signal }) => getOutboxMessage(id, signal), staleTime: Infinity });

export const useOutboxMessage = (id: string | undefined) => useQuery({ ...getOutboxMessageQueryOptions(id ?? ""), enabled: Boolean(id) });
