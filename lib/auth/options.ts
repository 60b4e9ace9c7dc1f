import "server-only";

import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";

import { recordAudit } from "@/db/queries/audit";
import { createAuthSession, findUserByEmail, revokeAuthSession } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { env } from "@/lib/env";

import { verifyPassword } from "./password";
import { clearSignInAttempts } from "./rate-limit";

export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 60 * 60;

const credentials = z.object({ email: z.string().trim().email().max(320), password: z.string().min(1).max(200) });

type Headers = Record<string, string | string[] | undefined> | undefined;
const header = (h: Headers, name: string) => {
  const v = h?.[name];
  return (Array.isArray(v) ? v[0] : v) ?? null;
};
export const clientAddress = (h: Headers) => header(h, "x-forwarded-for")?.split(",")[0]?.trim() || header(h, "x-real-ip") || "local";

declare module "next-auth" {
  interface User {
    role: Role;
    sid: string;
  }
  interface Session {
    user: { id: string; email: string; name: string; role: Role };
    sid: string;
  }
}
declare module "next-auth/jwt" {
  interface JWT {
    uid?: string;
    role?: Role;
    sid?: string;
  }
}

export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(raw, req) {
          const parsed = credentials.safeParse(raw);
          if (!parsed.success) return null;
          const ip = clientAddress(req?.headers);
          const user = await findUserByEmail(parsed.data.email);
          const ok = user && !user.disabledAt && (await verifyPassword(parsed.data.password, user.passwordHash));
          if (!user || !ok) {
            await recordAudit({ actorId: user?.id ?? null, action: "auth.sign_in_failed", ip, data: { email: parsed.data.email.toLowerCase() } });
            return null;
          }
          await clearSignInAttempts(user.email);
          const sid = await createAuthSession({
            userId: user.id,
            sessionVersion: user.sessionVersion,
            ip,
            userAgent: header(req?.headers, "user-agent")?.slice(0, 300) ?? null,
            expiresAt: new Date(Date.now() + SESSION_MAX_AGE_SECONDS * 1000),
          });
          await recordAudit({ actorId: user.id, action: "auth.sign_in", ip });
          return { id: user.id, email: user.email, name: user.name, role: user.role, sid };
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.uid = user.id;
          token.role = user.role;
          token.sid = user.sid;
        }
        return token;
      },
      session({ session, token }) {
        session.user = { id: token.uid ?? "", email: token.email ?? "", name: token.name ?? "", role: token.role ?? "buyer" };
        session.sid = token.sid ?? "";
        return session;
      },
    },
    events: {
      async signOut({ token }) {
        if (token?.sid) await revokeAuthSession(token.sid);
      },
    },
  };
}
