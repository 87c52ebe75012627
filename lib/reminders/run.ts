import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/store';
import type { Mail } from '@/lib/mail';
import { Lamp, User } from '@/models';
import { Op } from 'sequelize';
import { byKeeper, dueItems, type DueItem } from './due';
import { deliverQueued, enqueueReminder } from './outbox';

export type RunResult = { due: number; queued: number; sent: number; failed: number };

const BATCH = 200;

/**
 * One pass of the reminder job: find every lamp in use that is due for a test or a replacement, queue one
 * e-mail per keeper for the dates not announced before, then deliver the outbox.
 */
export async function runReminders(
  opts: { today?: string; send?: (mail: Mail) => Promise<void> } = {},
): Promise<RunResult> {
  getSequelize();
  const today = opts.today ?? todayIso();
  const items: DueItem[] = [];
  for (let cursor = 0; ;) {
    const lamps = await Lamp.findAll({
      where: { retiredOn: null, id: { [Op.gt]: cursor } },
      order: [['id', 'ASC']],
      limit: BATCH,
    });
    if (lamps.length === 0) break;
    cursor = lamps[lamps.length - 1]!.id;
    const summaries = await summarise(lamps, today);
    items.push(
      ...dueItems(
        summaries.map((s) => ({
          lampId: s.id,
          label: s.label,
          enclosureName: s.enclosure.name,
          keeperId: s.enclosure.keeperId,
          status: s.status,
          testDueOn: s.testDueOn,
          replaceDueOn: s.replaceDueOn,
          replaceBasis: s.replaceBasis,
          reasons: s.reasons,
        })),
        today,
      ),
    );
    if (lamps.length < BATCH) break;
  }
  const groups = byKeeper(items);
  const keepers = await User.findAll({
    where: { id: [...groups.keys()] },
    attributes: ['id', 'name', 'email'],
  });
  let queued = 0;
  for (const keeper of keepers) {
    if (await enqueueReminder(keeper, groups.get(keeper.id) ?? [], config().APP_URL)) queued++;
  }
  const delivery = await deliverQueued({ send: opts.send });
  return { due: items.length, queued, ...delivery };
}
