import {
  printerProfileInputSchema,
  type PrinterProfile,
  type PrinterProfileInput,
  type PrinterProfilePage,
} from '../../../../shared/schemas/printer-profile';

const isPage = (data: unknown): data is PrinterProfilePage =>
  typeof data === 'object' && data !== null && 'items' in data && 'total' in data;
const isProfile = (data: unknown): data is PrinterProfile =>
  typeof data === 'object' && data !== null && 'id' in data && 'buildVolume' in data;

/**
 * A cached printer-profile query (a list page or one profile) as it looks once the edit `body` of profile `id`
 * is saved, so the table and the fit-tests page show the change at once. Anything else under the same keys
 * (a fit-test list), another profile, or a body the schema refuses comes back unchanged.
 *
 * @param data - the cached query data, of any query under the printer profiles' keys
 * @param id - the edited profile's id
 * @param body - the form's values
 * @returns the data to show while the save is on the way
 */
export function withProfileEdit<T>(data: T, id: string, body: PrinterProfileInput): T {
  const parsed = printerProfileInputSchema.safeParse(body);
  if (!parsed.success) return data;
  const edited = (p: PrinterProfile): PrinterProfile => (p.id === id ? { ...p, ...parsed.data } : p);
  if (isPage(data)) return { ...data, items: data.items.map(edited) };
  if (isProfile(data)) return edited(data) as T;
  return data;
}
