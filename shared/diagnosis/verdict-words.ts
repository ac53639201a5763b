import type { Verdict } from '../engine/verdict';

/** A verdict in plain trade words, for every screen and message (never told by colour alone). */
export const VERDICT_WORDS: Record<Verdict, string> = {
  in_spec: 'In spec',
  low: 'Low',
  high: 'High',
  open: 'Open circuit',
  marginal: 'Marginal',
  no_reading: 'No reading',
};
