// GET /api/orders - the agent's orders (admin: all), paged; POST /api/orders - place an order
import { createOrder } from "@/db/queries/order-commands";
import { listOrdersPage } from "@/db/queries/order-lists";
import { json, route } from "@/lib/api/route";
import { createOrderSchema, listOrdersQuery } from "@/lib/validations/orders";

export const GET = route({ permission: "orders:list", query: listOrdersQuery }, async ({ user, query }) =>
  listOrdersPage(user.role === "admin" ? null : user.id, query),
);

export const POST = route({ permission: "orders:create", body: createOrderSchema }, async ({ user, body }) => json(await createOrder(user, body), 201));
