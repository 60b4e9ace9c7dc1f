import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";

import { Card, CardBody } from "@/components/ui/card";
import { authLink, safeNextPath } from "@/lib/auth/next-path";
import { getCurrentUser, homeFor } from "@/lib/auth/session";

import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ email?: string; role?: string; next?: string }> }) {
  const { email, role, next: nextParam } = await searchParams;
  const next = safeNextPath(nextParam);
  const user = await getCurrentUser();
  if (user) redirect(next ?? homeFor(user.role));
  const defaultEmail = typeof email === "string" ? email.slice(0, 320) : "";
  const defaultRole = role === "agent" || role === "inspector" || role === "buyer" ? role : undefined;
  return (
    <Card>
      <CardBody className="space-y-6 p-6 sm:p-8">
        <div className="space-y-2">
          <h1 className="font-serif text-3xl">Create your account</h1>
          <p className="text-sm text-ink-2">One account, one role. Buyers: use the e-mail address your agent sent the invitation to.</p>
        </div>
        <SignUpForm defaultEmail={defaultEmail} defaultRole={defaultRole} next={next} />
        <p className="text-sm text-ink-2">
          Already have an account?{" "}
          <Link href={authLink("/sign-in", { email: defaultEmail, next })} className="font-medium text-teal underline underline-offset-4">
            Sign in
          </Link>
        </p>
      </CardBody>
    </Card>
  );
}
