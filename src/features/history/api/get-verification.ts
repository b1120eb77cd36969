import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { verificationDto, versionComparisonDto, type CompareQuery, type VerificationQuery } from "@shared/api/verification.ts";
import { api } from "@/lib/api-client.ts";
import { historyKeys } from "./history-keys.ts";

type Query = Record<string, string | number | boolean | null | undefined>;

/** Query parameters as the server reads them (report kinds comma-separated). */
function asQuery(query: VerificationQuery | CompareQuery): Query {
  const { kinds, ...rest } = query;
  return { ...rest, kinds: kinds && kinds.length > 0 ? kinds.join(",") : undefined };
}

export const verificationQueryOptions = (query: VerificationQuery) =>
  queryOptions({
    queryKey: historyKeys.verification(query),
    queryFn: ({ signal }) => api.get("/api/verification", { query: asQuery(query), schema: verificationDto, signal }),
    placeholderData: keepPreviousData,
  });

export function useVerification(query: VerificationQuery | null) {
  return useQuery({ ...verificationQueryOptions(query ?? ({} as VerificationQuery)), enabled: query !== null });
}

/** A backtest of two versions: costly (every stored frame is evaluated twice), so run on request and kept. */
export function useVersionComparison(query: CompareQuery | null) {
  return useQuery({
    queryKey: historyKeys.comparison(query ?? ({} as CompareQuery)),
    queryFn: ({ signal }) => api.get("/api/verification/compare", { query: asQuery(query!), schema: versionComparisonDto, signal }),
    enabled: query !== null,
    staleTime: 5 * 60_000,
    refetchOnWindowFocus: false,
  });
}
