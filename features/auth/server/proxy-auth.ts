import "server-only";
import NextAuth from "next-auth";
import { getEnv } from "@/lib/env";
import { SESSION_MAX_AGE_SECONDS } from "@/features/auth/server/session-cookie";

/**
 * The session reader proxy.ts runs before every page: the same secret, cookie and JWT settings as
 * auth-config.ts, but no adapter, providers or database (Auth.js's split configuration for
 * middleware), so the proxy bundle carries neither the database driver nor the mail transport.
 */
export const { auth: proxyAuth } = NextAuth(() => ({
  secret: getEnv().AUTH_SECRET,
  trustHost: true,
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS, updateAge: 15 * 60 },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [],
  callbacks: {
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
}));
