import { ownedRoute } from '@/lib/api';
import { counterLampView } from '@/lib/counter/queries';

/** A lamp tested at the counter: its customer, every reading, and today's answer from all of them. */
export const GET = ownedRoute('counter-lamp', 'read', {
  handler: async ({ thing: lamp }) => ({ lamp: await counterLampView(lamp) }),
});
