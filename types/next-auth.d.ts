import type { MembershipClaim } from '@/lib/permissions';

// What our sessions carry beyond next-auth's defaults.
declare module 'next-auth' {
  interface Session {
    user: {
      id: number;
      name: string;
      email: string;
      sessionVersion: number;
      memberships: MembershipClaim[];
    };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid: number;
    sv: number;
    /** This session's id: signing out records it as ended (lib/auth/ended-sessions.ts). */
    sid?: string;
    memberships?: MembershipClaim[];
    /** When the session version and memberships were last checked against the database (ms). */
    checkedAt?: number;
  }
}
