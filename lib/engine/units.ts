// The international foot is defined as exactly 0.3048 m, the inch as exactly 25.4 mm.
export const METRES_PER_FOOT = 0.3048;
export const MM_PER_INCH = 25.4;

export const metresToFeet = (m: number): number => m / METRES_PER_FOOT;
export const feetToMetres = (ft: number): number => ft * METRES_PER_FOOT;
export const mmToInches = (mm: number): number => mm / MM_PER_INCH;
export const inchesToMm = (inches: number): number => inches * MM_PER_INCH;

// Counter footages are read to a tenth at best; this only absorbs floating-point noise.
export const FOOTAGE_EPSILON = 1e-6;
