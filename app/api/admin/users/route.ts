// GET /api/admin/users - search users by name, e-mail or company, role and state (admin only)
import { searchUsers } from "@/db/queries/admin-users";
import { route } from "@/lib/api/route";
import { userSearchQuery } from "@/lib/validations/admin";

export const GET = route({ permission: "admin:manage", hide: true, query: userSearchQuery }, async ({ query }) => searchUsers(query));
