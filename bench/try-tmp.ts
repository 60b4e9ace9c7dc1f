import { evaluate, CLAY_LATERAL_1950S, PVC_LATERAL_1990S } from "../lib/engine";
const e = evaluate(CLAY_LATERAL_1950S);
console.log(JSON.stringify(e, null, 1));
console.log(evaluate(PVC_LATERAL_1990S).summary);
