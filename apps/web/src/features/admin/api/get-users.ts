import { queryOptions, useQuery } from "@tanstack/react-query";
import { userSchema, type User } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

export const getUsers = (signal?: AbortSignal) => api.get<User[]>("/api/users", { signal, schema: z.array(userSchema) });

export const getUsersQueryOptions = () => queryOptions({ queryKey: ["users", "list"], queryFn: ({ signal }) => getUsers(signal) });

export const useUsers = () => useQuery(getUsersQueryOptions());
