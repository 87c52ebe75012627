'use client';

import { useEffect } from 'react';
import { apiFetch } from '@/components/ui/api-client';
import { SESSION_REFRESH_MS } from '@/lib/auth/lifetime';

/**
 * Asks next-auth for the session, which re-issues its cookie for another lifetime (lib/auth/lifetime.ts).
 * A failure is left alone: the next renewal tries again, and an ended session shows on the next page.
 */
function renew(): void {
  void apiFetch('/api/auth/session').catch(() => undefined);
}

/**
 * Keeps a signed-in tab's session alive while it is open and visible: a renewal every
 * SESSION_REFRESH_MS, and one when the tab becomes visible again (a hidden tab's timers may be held
 * back). An ended session (signed out everywhere, lifetime over) is not renewed: the next save or
 * page answers 401 or goes to sign-in, and the studio keeps unsaved work on the device.
 */
export function SessionKeepAlive() {
  useEffect(() => {
    let last = Date.now();
    const renewIfVisible = (minGapMs: number) => {
      if (document.visibilityState !== 'visible' || Date.now() - last < minGapMs) return;
      last = Date.now();
      renew();
    };
    const timer = setInterval(() => renewIfVisible(0), SESSION_REFRESH_MS);
    // Coming back to the tab renews it unless that was done in the last minute.
    const onVisible = () => renewIfVisible(60_000);
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      clearInterval(timer);
      document.removeEventListener('visibilitychange', onVisible);
    };
  }, []);
  return null;
}
