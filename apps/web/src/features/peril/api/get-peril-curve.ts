import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { perilCurveSchema, type PerilCurve, type PerilProfileBody } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

/** Warming levels of the editor's preview: 0–5 K above 1850–1900 in 0.05 K steps. */
export const PREVIEW_RANGE = { from: 0, to: 5, step: 0.05, percentiles: [5, 17, 50, 83, 95] };

/** The exact multiplier bands of an unsaved draft (the engine runs on the server; the app cannot import it). */
export const previewPerilCurve = (profile: PerilProfileBody, signal?: AbortSignal) =>
  api.post<PerilCurve>("/api/peril-profiles/preview", { profile, range: PREVIEW_RANGE }, { signal, schema: perilCurveSchema });

export const getPerilCurveQueryOptions = (profile: PerilProfileBody | null) =>
  queryOptions({
    queryKey: [...perilRootKey, "curve-preview", profile],
    queryFn: ({ signal }) => previewPerilCurve(profile!, signal),
    staleTime: Infinity,
    retry: false,
  });

/** Keeps the last good curve on screen while a new draft is checked (no flicker while typing). */
export const usePerilCurvePreview = (profile: PerilProfileBody | null) =>
  useQuery({ ...getPerilCurveQueryOptions(profile), enabled: profile !== null, placeholderData: keepPreviousData });
