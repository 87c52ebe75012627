import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { customerFor } from '@/lib/customers/access';
import { customerExport } from '@/lib/customers/export';
import { fileStem } from '@/lib/files/file-name';
import { download } from '@/lib/reports/build';

/**
 * One customer's data as a JSON file, for their request: their record, consent and the e-mails sent
 * under it, their lamps, readings and verdicts. Owners and staff of the shop only.
 */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const customer = await customerFor(user, params.id, 'read');
    const data = await customerExport(customer);
    return download(
      `${JSON.stringify(data, null, 2)}\n`,
      'application/json; charset=utf-8',
      `customer-${customer.id}-${fileStem(customer.name, 'customer')}.json`,
    );
  },
});
