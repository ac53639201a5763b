import type { PathSoFar } from './decide-step';

/** A recorded step as the server stores it and the phone holds it, with what the next step needs to know. */
export interface RecordedStep {
  checkId: string;
  valueSi: number | null;
  overRange: boolean;
  retracted: boolean;
  evaluation: { uncertainty: number } | null;
}

/**
 * The live path `decideStep` takes, from the steps recorded so far in the order taken: retracted steps left
 * out, each reading with the uncertainty its evaluation gave it. The server, the phone and the demo seed all
 * build it here, so a step is judged the same way wherever it is decided.
 */
export function pathSoFar(steps: readonly RecordedStep[]): PathSoFar {
  const path: PathSoFar[number][] = [];
  for (const s of steps) {
    if (!s.retracted) path.push({ checkId: s.checkId, value: s.valueSi, overRange: s.overRange, uncertainty: s.evaluation?.uncertainty });
  }
  return path;
}
