// npm run admin:create -- email@example.com "Full Name"   (reads the password from ADMIN_PASSWORD or stdin)
import { createInterface } from "node:readline/promises";

import { closeDb } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { createUser } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { signUpSchema } from "@/lib/validations/auth";

import { fail } from "./lib/boot";
import { openOffline } from "./lib/offline";

async function main() {
  const [email, name] = process.argv.slice(2);
  openOffline();
  let password = process.env.ADMIN_PASSWORD;
  if (!password) {
    const rl = createInterface({ input: process.stdin, output: process.stdout });
    password = await rl.question("Password for the new admin (10+ characters): ");
    rl.close();
  }
  const parsed = signUpSchema.omit({ role: true }).safeParse({ email, name, password });
  if (!parsed.success) {
    console.error(`Cannot create the admin:\n${parsed.error.issues.map((i) => `  - ${i.path.join(".")}: ${i.message}`).join("\n")}`);
    process.exit(2);
  }
  const user = await createUser({ email: parsed.data.email, name: parsed.data.name, role: "admin", passwordHash: await hashPassword(parsed.data.password) });
  if (!user) {
    console.error(`An account with ${parsed.data.email} already exists.`);
    process.exit(2);
  }
  await recordAudit({ action: "admin.created_from_cli", targetType: "user", targetId: user.id });
  console.log(`Admin ${user.email} created.`);
  await closeDb();
}

main().catch(fail);
