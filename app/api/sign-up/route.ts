// POST /api/sign-up - create an agent, inspector or buyer account (admins come from the seed or the CLI)
import { recordAudit } from "@/db/queries/audit";
import { createUser } from "@/db/queries/users";
import { json, route } from "@/lib/api/route";
import { hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import { signUpSchema } from "@/lib/validations/auth";

export const POST = route({ permission: "public", body: signUpSchema }, async ({ body }) => {
  const { password, ...profile } = body;
  const user = await createUser({ ...profile, company: profile.company || null, passwordHash: await hashPassword(password) });
  if (!user) {
    throw new AppError("conflict", "An account with that e-mail already exists. Sign in instead.", { email: ["An account with that e-mail already exists."] });
  }
  await recordAudit({ actorId: user.id, action: "auth.sign_up", targetType: "user", targetId: user.id, data: { role: user.role } });
  return json({ id: user.id, email: user.email, name: user.name, role: user.role }, 201);
});
