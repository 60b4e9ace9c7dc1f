import { noSuch } from "../core/errors";
import type { ApiHandler, ApiRoute } from "./types";

const retrieve: ApiHandler = (ctx, { params, path }) => {
  params.allowOnly(["expand"]);
  const record = ctx.events.find(path.id as string);
  if (!record) throw noSuch("event", path.id as string);
  return record.event;
};

export const eventRoutes: ApiRoute[] = [{ method: "GET", pattern: "/v1/events/:id", handler: retrieve }];
