// published: OSHA 29 CFR 1926.652(a)(1): a trench 5 ft or deeper needs a protective system
// (sloping, shoring or a shield) unless it is in stable rock.
export const PROTECTIVE_SYSTEM_DEPTH_FT = 5;
// published: OSHA 29 CFR 1926.651(c)(2): a trench 4 ft or deeper needs a ladder or ramp within
// 25 ft of travel.
export const LADDER_DEPTH_FT = 4;
