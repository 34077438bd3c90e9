import { accountList } from '../../../../lib/db/accounts';
import { endpoint } from '../../../../lib/http/endpoint';

/** Every account, newest first (admins). */
export const GET = endpoint({ access: ['admin'] }, async () => ({ accounts: await accountList() }));
