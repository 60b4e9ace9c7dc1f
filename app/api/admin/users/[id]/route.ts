// PATCH /api/admin/users/{id} - disable or enable an account, or change its role with a reason (admin only)
import { changeUser } from "@/db/queries/admin-users";
import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { AppError, notFound } from "@/lib/errors";
import { updateUserSchema, userIdParams } from "@/lib/validations/admin";

export const PATCH = route(
  { permission: "admin:manage", hide: true, params: userIdParams, body: updateUserSchema },
  async ({ user, params, body, req }) => {
    if (params.id === user.id)
      throw new AppError("forbidden", "You cannot disable your own account or change your own role; ask another admin.");
    const changed = await changeUser(
      params.id,
      { disabled: body.disabled, role: body.role, reason: body.reason || null },
      { id: user.id, ip: clientAddress(Object.fromEntries(req.headers)) },
    );
    if (!changed) throw notFound("That user");
    return { user: changed };
  },
);
