import { redirect } from "next/navigation";

import { getCurrentUser, homeFor } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

/** After sign-in: each role lands on its own home. */
export default async function HomeRedirect() {
  const user = await getCurrentUser();
  redirect(user ? homeFor(user.role) : "/sign-in");
}
