// GET /api/me - the signed-in user
import { route } from "@/lib/api/route";

export const GET = route({ permission: "account:read" }, async ({ user }) => ({
  id: user.id,
  name: user.name,
  email: user.email,
  role: user.role,
}));
