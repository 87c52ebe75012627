import { ownedRoute } from '@/lib/api';
import { customerExport } from '@/lib/customers/export';
import { fileStem } from '@/lib/files/file-name';
import { download } from '@/lib/reports/build';

/**
 * One customer's data as a JSON file, for their request: their record, consent and the e-mails sent
 * under it, their lamps, readings and verdicts. Owners and staff of the shop only.
 */
export const GET = ownedRoute('customer', 'read', {
  handler: async ({ thing: customer }) => {
    const data = await customerExport(customer);
    return download(
      `${JSON.stringify(data, null, 2)}\n`,
      'application/json; charset=utf-8',
      `customer-${customer.id}-${fileStem(customer.name, 'customer')}.json`,
    );
  },
});
