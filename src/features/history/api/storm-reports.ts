import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { stormReportListDto, stormReportUploadDto, type StormReportsQuery } from "@shared/api/storm-reports.ts";
import { api } from "@/lib/api-client.ts";
import { historyKeys } from "./history-keys.ts";

export const stormReportsQuery = (query: StormReportsQuery) =>
  queryOptions({
    queryKey: historyKeys.reports(query),
    queryFn: ({ signal }) => api.get("/api/storm-reports", { query: { ...query }, schema: stormReportListDto, signal }),
    staleTime: 60_000,
  });

export function useStormReports(query: StormReportsQuery, enabled = true) {
  return useQuery({ ...stormReportsQuery(query), enabled });
}

/** Uploads a CSV file; on success every report list and every score is refetched. */
export function useUploadStormReports() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append("file", file);
      return api.post("/api/storm-reports", form, { schema: stormReportUploadDto });
    },
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: historyKeys.reportsAll() });
      void queryClient.invalidateQueries({ queryKey: historyKeys.verificationAll() });
    },
  });
}
