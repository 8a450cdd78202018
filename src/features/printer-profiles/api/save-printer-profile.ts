import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  printerProfileSchema,
  type PrinterProfileInput,
  type PrinterProfilePage,
} from '../../../../shared/schemas/printer-profile';
import { apiFetch } from '../../../lib/api-client';
import { withProfileEdit } from '../lib/profile-edit';
import { printerKeys } from './printer-profiles';

/** POST …/printer-profiles, or PATCH …/printer-profiles/:id when `id` is given (editors, owners). */
export async function savePrinterProfile(teamId: string, body: PrinterProfileInput, id?: string) {
  const path = id ? `/teams/${teamId}/printer-profiles/${id}` : `/teams/${teamId}/printer-profiles`;
  return printerProfileSchema.parse(
    await apiFetch(path, { method: id ? 'PATCH' : 'POST', body: JSON.stringify(body) }),
  );
}

/**
 * Creates a profile, or saves an edited one optimistically: the lists and the profile's own page show the
 * change at once and get their old data back when the server refuses it (the form then shows its message).
 */
export function useSavePrinterProfile(teamId: string) {
  const queryClient = useQueryClient();
  const all = { queryKey: printerKeys.all(teamId) };
  return useMutation({
    mutationFn: ({ body, id }: { body: PrinterProfileInput; id?: string }) => savePrinterProfile(teamId, body, id),
    onMutate: async ({ body, id }) => {
      if (!id) return undefined;
      await queryClient.cancelQueries(all);
      const previous = queryClient.getQueriesData<unknown>(all);
      queryClient.setQueriesData<unknown>(all, (data: unknown) => withProfileEdit(data, id, body));
      return { previous };
    },
    onError: (_e, _vars, context) => context?.previous.forEach(([key, data]) => queryClient.setQueryData(key, data)),
    onSettled: () => queryClient.invalidateQueries(all),
  });
}

/** DELETE …/printer-profiles/:id (owners); the row leaves every cached page at once and comes back on failure. */
export function useDeletePrinterProfile(teamId: string) {
  const queryClient = useQueryClient();
  const lists = { queryKey: printerKeys.all(teamId) };
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/teams/${teamId}/printer-profiles/${id}`, { method: 'DELETE' }),
    onMutate: async (id) => {
      await queryClient.cancelQueries(lists);
      const previous = queryClient.getQueriesData<PrinterProfilePage>(lists);
      queryClient.setQueriesData<PrinterProfilePage>(
        lists,
        (page) => page && { ...page, items: page.items.filter((p) => p.id !== id), total: page.total - 1 },
      );
      return { previous };
    },
    onError: (_e, _id, context) => context?.previous.forEach(([key, data]) => queryClient.setQueryData(key, data)),
    onSettled: () => queryClient.invalidateQueries(lists),
  });
}
