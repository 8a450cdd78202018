import { useQuery } from '@tanstack/react-query';
import { accountQueryOptions } from '../../../lib/units-preference';

// GET /api/account is defined in src/lib/units-preference.ts: the design screen reads the same account.
export { accountQueryOptions, getAccount } from '../../../lib/units-preference';

/** GET /api/account: the account's own details, including whether the address is confirmed. */
export const useAccount = () => useQuery(accountQueryOptions());
