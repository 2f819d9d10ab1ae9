import "server-only";
import NextAuth, { CredentialsSignin, type NextAuthConfig } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { getEnv } from "@/lib/env";
import { ZSignInInput } from "@/features/auth/schemas/sign-in";
import { recordAudit } from "@/features/auth/server/audit";
import { dealershipIdsOf } from "@/features/auth/server/dealership-ids-of";
import { getMailer } from "@/features/auth/server/mailer";
import { magicLinkMail } from "@/features/auth/server/mail-templates";
import { verifyPassword } from "@/lib/authz/password";
import { SESSION_MAX_AGE_SECONDS } from "@/features/auth/server/session-cookie";
import {
  checkSignInLimits,
  clientIp,
  countFailedPasswordSignIn,
  isPasswordSignInBlocked,
} from "@/features/auth/server/sign-in-limits";

/** Thrown when too many attempts came from one address or IP; the form shows a wait message. */
class RateLimitedSignIn extends CredentialsSignin {
  override code = "rate_limited";
}

async function findUserByEmail(email: string) {
  const [user] = await getDb().select().from(users).where(eq(users.email, email)).limit(1);
  return user ?? null;
}

/** Checks an e-mail and password; every failure looks the same to the person signing in. */
async function authorizePassword(raw: unknown, request: Request) {
  const parsed = ZSignInInput.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const db = getDb();
  const ip = clientIp(request?.headers);
  const blocked = await isPasswordSignInBlocked(db, { email, ip });
  const user = await findUserByEmail(email);
  const dealershipIds = user ? await dealershipIdsOf(getDb(), user.id) : [];
  if (blocked) {
    await recordAudit(db, { kind: "sign_in_rate_limited", dealershipIds, subject: email, ip });
    throw new RateLimitedSignIn();
  }
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok) {
    await countFailedPasswordSignIn(db, { email, ip });
    await recordAudit(db, {
      kind: "sign_in_failed",
      dealershipIds,
      actorUserId: user?.id,
      subject: email,
      detail: { method: "password" },
      ip,
    });
    return null;
  }
  await recordAudit(db, {
    kind: "sign_in",
    dealershipIds,
    actorUserId: user.id,
    subject: email,
    detail: { method: "password" },
    ip,
  });
  return { id: user.id, email: user.email, name: user.name };
}

function buildConfig(): NextAuthConfig {
  const env = getEnv();
  const db = getDb();
  return {
    secret: env.AUTH_SECRET,
    trustHost: true,
    logger: {
      // A wrong password is routine and already in the audit log; keep the server log for faults.
      error(error) {
        if ((error as { type?: string }).type === "CredentialsSignin") return;
        console.error("[auth]", error);
      },
    },
    adapter: DrizzleAdapter(db, {
      usersTable: users,
      accountsTable: accounts,
      sessionsTable: sessions,
      verificationTokensTable: verificationTokens,
    }),
    // Credentials sign-in needs JWT sessions; roles are still read from the database per request.
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS, updateAge: 15 * 60 },
    pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
    providers: [
      Credentials({
        id: "credentials",
        credentials: { email: { type: "email" }, password: { type: "password" } },
        authorize: authorizePassword,
      }),
      Nodemailer({
        server: { host: env.SMTP_HOST, port: env.SMTP_PORT },
        from: env.MAIL_FROM,
        maxAge: 15 * 60,
        normalizeIdentifier: (identifier) => identifier.trim().toLowerCase(),
        async sendVerificationRequest({ identifier, url, request }) {
          const ip = clientIp(request?.headers);
          const limit = await checkSignInLimits(db, { kind: "magic-link", email: identifier, ip });
          // Links go only to existing accounts; the page says the same thing either way.
          const user = await findUserByEmail(identifier);
          if (!limit.allowed) {
            await recordAudit(db, {
              kind: "sign_in_rate_limited",
              dealershipIds: user ? await dealershipIdsOf(db, user.id) : [],
              subject: identifier,
              detail: { method: "magic-link" },
              ip,
            });
            throw new Error("Too many sign-in links requested");
          }
          if (!user) return;
          await recordAudit(db, {
            kind: "magic_link_requested",
            dealershipIds: await dealershipIdsOf(getDb(), user.id),
            actorUserId: user.id,
            subject: identifier,
            ip,
          });
          await getMailer().send(magicLinkMail(identifier, url));
        },
      }),
    ],
    callbacks: {
      // No self sign-up: a magic link only completes for an account that already exists.
      async signIn({ user, account, email }) {
        if (account?.provider !== "nodemailer" || email?.verificationRequest) return true;
        return Boolean(user.email && (await findUserByEmail(user.email)));
      },
      session({ session, token }) {
        if (token.sub) session.user.id = token.sub;
        return session;
      },
      // Used by proxy.ts: pages need a valid session; route handlers check roles themselves.
      authorized({ auth }) {
        return Boolean(auth?.user);
      },
    },
    events: {
      async signIn({ user, account }) {
        if (account?.provider !== "nodemailer" || !user.id) return;
        await recordAudit(db, {
          kind: "sign_in",
          dealershipIds: await dealershipIdsOf(getDb(), user.id),
          actorUserId: user.id,
          subject: user.email,
          detail: { method: "magic-link" },
        });
      },
    },
  };
}

export const { handlers, auth, signIn, signOut } = NextAuth(() => buildConfig());
