/**
 * Peak-and-mean aggregation, the shape most grading methods in the trade share: score each
 * defect, then summarise a pipe by its peak and by a per-length mean, each turned into a grade by
 * its own bands, the final grade being the worse of the two. Gradeline's own method (rating.ts)
 * runs on this; a published method's worked example checks it (tests/engine/aggregate.test.ts).
 */
export interface ScoredItem {
  at: number;
  score: number;
}

/**
 * Upper bounds, inclusive, of grades 1..n; a value above the last bound gets grade n + 1.
 * [5, 15, 40, 60] reads: up to 5 is grade 1, up to 15 grade 2, ... above 60 grade 5.
 */
export type Bands = readonly number[];

export interface AggregateInput {
  items: readonly ScoredItem[];
  /** Length the mean is taken over, in the same unit as `at`. */
  length: number;
  /** The mean is per this much length (1 for per metre, 100 for per 100 ft). */
  meanPer?: number;
  /** Sum scores within any window this long for the peak; omit to take the largest single score. */
  peakWindow?: number;
  peakBands: Bands;
  meanBands: Bands;
}

export interface Aggregate {
  total: number;
  mean: number;
  peak: number;
  peakGrade: number;
  meanGrade: number;
  finalGrade: number;
}

export function bandGrade(value: number, bands: Bands): number {
  let grade = 1;
  for (const bound of bands) if (value > bound) grade++;
  return grade;
}

/** Largest total of scores whose positions fall in any half-open window [x, x + w). */
export function windowPeak(items: readonly ScoredItem[], window: number): number {
  if (!(window > 0)) return items.reduce((m, i) => Math.max(m, i.score), 0);
  const sorted = [...items].sort((a, b) => a.at - b.at);
  let best = 0;
  let sum = 0;
  let lo = 0;
  for (let hi = 0; hi < sorted.length; hi++) {
    sum += sorted[hi].score;
    while (sorted[hi].at - sorted[lo].at >= window) sum -= sorted[lo++].score;
    best = Math.max(best, sum);
  }
  return best;
}

export function aggregate({ items, length, meanPer = 1, peakWindow, peakBands, meanBands }: AggregateInput): Aggregate {
  let total = 0;
  let single = 0;
  for (const item of items) {
    total += item.score;
    single = Math.max(single, item.score);
  }
  const mean = length > 0 ? (total / length) * meanPer : 0;
  const peak = peakWindow === undefined ? single : windowPeak(items, peakWindow);
  const peakGrade = bandGrade(peak, peakBands);
  const meanGrade = bandGrade(mean, meanBands);
  return { total, mean, peak, peakGrade, meanGrade, finalGrade: Math.max(peakGrade, meanGrade) };
}
