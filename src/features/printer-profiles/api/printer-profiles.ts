import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { printerProfilePageSchema, type PrinterProfileListQuery } from '../../../../shared/schemas/printer-profile';
import { apiFetch, toQueryString } from '../../../lib/api-client';

/** Query keys of the printer profiles feature. */
export const printerKeys = {
  all: (teamId: string) => ['teams', teamId, 'printer-profiles'] as const,
  list: (teamId: string, query: PrinterProfileListQuery) => ['teams', teamId, 'printer-profiles', query] as const,
};

/** GET /api/teams/:teamId/printer-profiles. */
export async function getPrinterProfiles(teamId: string, query: PrinterProfileListQuery) {
  return printerProfilePageSchema.parse(await apiFetch(`/teams/${teamId}/printer-profiles?${toQueryString(query)}`));
}

export const printerProfilesQueryOptions = (teamId: string, query: PrinterProfileListQuery) =>
  queryOptions({
    queryKey: printerKeys.list(teamId, query),
    queryFn: () => getPrinterProfiles(teamId, query),
    placeholderData: keepPreviousData,
  });
export const usePrinterProfiles = (teamId: string, query: PrinterProfileListQuery) =>
  useQuery(printerProfilesQueryOptions(teamId, query));

/** Every profile's id and name (up to 100), for pickers on other pages. */
export const usePrinterChoices = (teamId: string) => {
  const { data } = usePrinterProfiles(teamId, { sort: 'name', order: 'asc', pageSize: 100 });
  return data?.items.map(({ id, name, process }) => ({ id, name, process })) ?? [];
};
