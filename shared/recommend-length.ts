// The one home of the tip-clearance window: the reach rule and the "recommended length" shown on a
// drum type both call this. Lengths run from the opening's seat (where the head lands) to the tube
// tip; inside depth runs from the same seat to the inside bottom, so gap = insideDepth - length.

export interface ClearanceWindow {
  /** Smallest allowed gap between tip and drum bottom, mm: less and the tip bottoms out. */
  tipClearanceMinMm: number;
  /** Largest allowed gap, mm: more and the tube leaves slurry undrawn. */
  tipClearanceMaxMm: number;
}

export interface LengthRecommendation {
  /** Length that puts the tip in the middle of the window, mm. */
  targetMm: number;
  /** Shortest length that still reaches (tip at the maximum clearance), mm. */
  minLengthMm: number;
  /** Longest length that does not bottom out (tip at the minimum clearance), mm. */
  maxLengthMm: number;
}

export function validateClearanceWindow(w: ClearanceWindow): void {
  const { tipClearanceMinMm: min, tipClearanceMaxMm: max } = w;
  if (!Number.isFinite(min) || !Number.isFinite(max) || min < 0 || max < min) {
    throw new RangeError(`Tip clearance window must satisfy 0 <= min <= max, got min ${min} mm, max ${max} mm`);
  }
}

export function recommendDipTubeLength(input: { insideDepthMm: number } & ClearanceWindow): LengthRecommendation {
  validateClearanceWindow(input);
  const { insideDepthMm: depth, tipClearanceMinMm: min, tipClearanceMaxMm: max } = input;
  if (!Number.isFinite(depth) || depth <= max) {
    throw new RangeError(`Inside depth (${depth} mm) must be greater than the maximum tip clearance (${max} mm)`);
  }
  return { targetMm: depth - (min + max) / 2, minLengthMm: depth - max, maxLengthMm: depth - min };
}
