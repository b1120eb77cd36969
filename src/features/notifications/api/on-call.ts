import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { shiftDto, type ShiftInput } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import { notifyKeys } from "./notify-keys.ts";

const shiftsEnvelope = z.object({ shifts: z.array(shiftDto) });
const shiftEnvelope = z.object({ shift: shiftDto });

/** Shifts overlapping [from, to) (ISO UTC). */
export function useShifts(from: string, to: string) {
  return useQuery({
    queryKey: notifyKeys.shifts(from, to),
    queryFn: async ({ signal }) => (await api.get("/api/on-call", { query: { from, to }, schema: shiftsEnvelope, signal })).shifts,
  });
}

export function useSaveShift() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, input }: { id: number | null; input: ShiftInput }) =>
      (id === null ? await api.post("/api/on-call", input, { schema: shiftEnvelope }) : await api.put(`/api/on-call/${id}`, input, { schema: shiftEnvelope })).shift,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notifyKeys.shiftsAll() }),
  });
}

export function useDeleteShift() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/on-call/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notifyKeys.shiftsAll() }),
  });
}
