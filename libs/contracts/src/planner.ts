// The Planner part of the API: power of a randomized complete block trial (POST /api/stats/power).

/** The body of POST /api/stats/power: give blocks (to get the power) or targetPower (to get the blocks needed). */
export interface PowerRequest {
  treatments: number;
  /** Coefficient of variation, % of the mean. */
  cv: number;
  /** Smallest difference worth detecting between two treatment means, % of the mean. */
  difference: number;
  alpha?: number;
  sites?: number;
  blocks?: number;
  targetPower?: number;
}

/** With blocks: the power and the F distribution it used. With targetPower: the fewest blocks reaching it and their power. */
export interface PowerAnswer {
  blocks: number;
  power: number;
  noncentrality?: number;
  df1?: number;
  df2?: number;
}
