// GET /api/inspector/profile, PUT /api/inspector/profile - licence, service area, availability
import { recordAudit } from "@/db/queries/audit";
import { getInspectorProfile, saveInspectorProfile } from "@/db/queries/inspectors";
import { route } from "@/lib/api/route";
import { inspectorProfileSchema } from "@/lib/validations/orders";

export const GET = route({ permission: "profile:edit" }, async ({ user }) => ({ profile: await getInspectorProfile(user.id) }));

export const PUT = route({ permission: "profile:edit", body: inspectorProfileSchema }, async ({ user, body }) => {
  await saveInspectorProfile(user.id, body);
  await recordAudit({ actorId: user.id, action: "inspector.profile_saved", targetType: "user", targetId: user.id, data: { postalCodes: body.postalCodes.length } });
  return { profile: await getInspectorProfile(user.id) };
});
