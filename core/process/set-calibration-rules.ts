/**
 * The rules that decide whether first-off records may correct the set-removal model, as data: each with
 * where it comes from and whether it rests on a published source (`verified`). None is from a standard:
 * they are the shop's judgement, stated so a planner can see and change them.
 */
export interface CalibrationRule {
  value: number;
  source: string;
  verified: boolean;
}

export const CALIBRATION_RULES = {
  /** Past jobs farther than this similarity distance (db/search/similarity: 0 = the same spring) are not evidence. */
  maxDistance: {
    value: 1.5,
    source: 'shop judgement: about a 20 % change of wire and coil diameter together, or a grade change within the family with smaller changes',
    verified: false,
  },
  /** Records from at most this many of the nearest past jobs are fitted. */
  nearestJobs: { value: 8, source: 'shop judgement: the nearest springs speak for this one; farther ones add spread, not evidence', verified: false },
  /** Below this predicted set (mm) the ratio measured ÷ predicted is mostly the gauge's reading error. */
  minPredictedSet: {
    value: 0.05,
    source: 'common practice: free length is read to 0.01 mm on a height gauge; a set under five readings cannot be scaled',
    verified: false,
  },
  /** Scatter of the records about the fit, as a fraction of the typical predicted set, above which the fit is not trusted. */
  maxRelativeSpread: {
    value: 0.3,
    source: 'shop judgement: beyond ±30 % the records disagree among themselves more than a correction could help',
    verified: false,
  },
  /** Records needed before the fit replaces the model entirely; fewer move the model part of the way (n ÷ this). */
  recordsForFullWeight: {
    value: 5,
    source: 'shop judgement: one first-off can be an odd coil of wire; five that agree are the shop\'s own behaviour',
    verified: false,
  },
} as const satisfies Record<string, CalibrationRule>;
