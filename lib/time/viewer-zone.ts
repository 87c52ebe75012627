import 'server-only';
import { cookies } from 'next/headers';
import { FALLBACK_ZONE, knownZone, ZONE_COOKIE } from './format';

/**
 * The viewer's time zone as their browser last reported it (see components/ui/LocalTime.tsx), for
 * server components that format moments themselves; UTC before the browser has said.
 */
export async function viewerZone(): Promise<string> {
  return knownZone((await cookies()).get(ZONE_COOKIE)?.value) ?? FALLBACK_ZONE;
}
