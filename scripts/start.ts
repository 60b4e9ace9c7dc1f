import { boot, fail } from "./lib/boot";

// Production: real services from the environment. GRADELINE_STANDINS=1 runs the local stand-ins
// beside the built app (benchmarks and browser tests).
const standins = process.env.GRADELINE_STANDINS === "1";

boot({ dev: false, standins, seed: standins })
  .then(({ url }) => console.log(`Gradeline (production build) listening on ${url}`))
  .catch(fail);
