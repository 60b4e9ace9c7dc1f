import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";

import { Card, CardBody } from "@/components/ui/card";
import { authLink, safeNextPath } from "@/lib/auth/next-path";
import { getCurrentUser, homeFor } from "@/lib/auth/session";

import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ email?: string; next?: string }> }) {
  const { email, next: nextParam } = await searchParams;
  const next = safeNextPath(nextParam);
  const user = await getCurrentUser();
  if (user) redirect(next ?? homeFor(user.role));
  const defaultEmail = typeof email === "string" ? email.slice(0, 320) : "";
  return (
    <Card>
      <CardBody className="space-y-6 p-6 sm:p-8">
        <div className="space-y-2">
          <h1 className="font-serif text-3xl">Sign in</h1>
          <p className="text-sm text-ink-2">Agents, inspectors and buyers all sign in here.</p>
        </div>
        <SignInForm defaultEmail={defaultEmail} next={next} />
        <p className="text-sm text-ink-2">
          New to Gradeline?{" "}
          <Link href={authLink("/sign-up", { email: defaultEmail, role: next ? "buyer" : undefined, next })} className="font-medium text-teal underline underline-offset-4">
            Create an account
          </Link>
        </p>
      </CardBody>
    </Card>
  );
}
