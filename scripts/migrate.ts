// npm run db:migrate - apply pending migrations (the app also does this at start)
import { closeDb, getDb } from "@/db/client";

import { fail } from "./lib/boot";
import { openOffline } from "./lib/offline";

openOffline();
getDb()
  .then(async () => {
    console.log("Migrations are up to date.");
    await closeDb();
  })
  .catch(fail);
