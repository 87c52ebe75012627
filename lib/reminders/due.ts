import { addDays } from '@/lib/lamp-log/dates';
import type { Status } from '@/lib/lamp-log/outlook';
import type { ReminderKind } from '@/models/lamp-reminder';

/**
 * Which lamps a keeper should hear about today. Pure: the caller passes each lamp's outlook.
 * A lamp due for replacement is not also reminded to be tested; a reminder goes out a little ahead of
 * the date so there is time to buy a lamp or borrow a meter.
 */
export const LEAD_DAYS: Record<ReminderKind, number> = { test: 7, replace: 14 };

export type LampDueInput = {
  lampId: number;
  label: string;
  enclosureName: string;
  keeperId: number;
  status: Status;
  testDueOn: string | null;
  replaceDueOn: string | null;
  replaceBasis: 'readings' | 'typical interval' | null;
  reasons: string[];
};

export type DueItem = {
  lampId: number;
  label: string;
  enclosureName: string;
  keeperId: number;
  kind: ReminderKind;
  dueOn: string;
  basis: string;
  dedupeKey: string;
};

export const lampDedupeKey = (lampId: number, dueOn: string, kind: ReminderKind) =>
  `lamp:${lampId}:due:${dueOn}:${kind}`;

export function dueItems(lamps: readonly LampDueInput[], today: string): DueItem[] {
  const out: DueItem[] = [];
  for (const l of lamps) {
    if (l.status === 'retired' || l.status === 'heat-only') continue;
    const item = (kind: ReminderKind, dueOn: string, basis: string): DueItem => ({
      lampId: l.lampId,
      label: l.label,
      enclosureName: l.enclosureName,
      keeperId: l.keeperId,
      kind,
      dueOn,
      basis,
      dedupeKey: lampDedupeKey(l.lampId, dueOn, kind),
    });
    if (l.replaceDueOn && l.replaceDueOn <= addDays(today, LEAD_DAYS.replace)) {
      out.push(
        item(
          'replace',
          l.replaceDueOn,
          l.replaceBasis === 'readings'
            ? 'the basking spot falls below the species’ need (from the meter readings)'
            : 'the usual replacement age of this lamp type (no readings-based date yet)',
        ),
      );
      continue;
    }
    if (l.testDueOn && l.testDueOn <= addDays(today, LEAD_DAYS.test)) {
      out.push(item('test', l.testDueOn, l.reasons[0] ?? 'a meter reading is due'));
    }
  }
  return out;
}

/** Items grouped per keeper, in a stable order (by keeper, then date, then lamp). */
export function byKeeper(items: readonly DueItem[]): Map<number, DueItem[]> {
  const map = new Map<number, DueItem[]>();
  for (const i of [...items].sort(
    (a, b) => a.keeperId - b.keeperId || a.dueOn.localeCompare(b.dueOn) || a.lampId - b.lampId,
  )) {
    (map.get(i.keeperId) ?? map.set(i.keeperId, []).get(i.keeperId)!).push(i);
  }
  return map;
}
