// npm run db:seed - seed the invented demo world (once; running it again changes nothing)
import { closeDb } from "@/db/client";
import { seedDemoWorld } from "@/db/seed";

import { fail } from "./lib/boot";
import { openOffline } from "./lib/offline";

openOffline();
seedDemoWorld()
  .then(async ({ seeded }) => {
    console.log(seeded ? "Demo world seeded." : "The demo world is already there; nothing changed.");
    await closeDb();
  })
  .catch(fail);
