import NextAuth from 'next-auth';
import { authOptions } from '@/lib/auth';
import { config } from '@/lib/config';

// next-auth builds its callback URLs from NEXTAUTH_URL; default it to the app's own address.
process.env.NEXTAUTH_URL ??= config().APP_URL;

const handler = NextAuth(authOptions);

export { handler as GET, handler as POST };
