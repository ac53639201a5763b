import type { Evaluation } from '../engine/evaluate';
import { explainEvaluation } from '../engine/explain';
import { marginalPolicyOf, requiredVerdicts } from '../engine/outcomes';
import type { Check, MeasureCheck, ProcedureDocument } from '../engine/procedure';
import { VERDICTS, type Verdict } from '../engine/verdict';
import { VERDICT_WORDS } from '../diagnosis/verdict-words';
import type { PracticeAsk } from './schemas';

/** The parts of a recorded step a practice question is built from. */
export interface PracticeStep {
  checkId: string;
  verdict: Verdict | null;
  evaluation: Evaluation | null;
  choiceId: string | null;
  nextCheckId: string | null;
  retracted: boolean;
}

export interface PracticeChoice {
  /** A verdict key or a check id: what the answer sends. */
  value: string;
  label: string;
}

export interface PracticeQuestion {
  asked: PracticeAsk;
  prompt: string;
  choices: PracticeChoice[];
  /** The recorded answer; the server scores against it, the client never decides. */
  expected: string;
}

export type PracticeScore =
  | { ok: true; correct: boolean; expected: string; expectedLabel: string; explanation: string }
  | { ok: false; status: 400 | 409; code: string; message: string };

const checkOf = (document: ProcedureDocument, id: string | null): Check | undefined => document.checks.find((c) => c.id === id);

/**
 * The questions a step can be practised with. A measure step asks for the verdict of its reading (retracted
 * readings too: a detour's verdict is still worth judging); a step on the path with a real choice of next
 * check asks which one comes next. The first question is the one the replay shows.
 */
export function practiceQuestions(document: ProcedureDocument, step: PracticeStep): PracticeQuestion[] {
  const check = checkOf(document, step.checkId);
  if (!check) return [];
  const questions: PracticeQuestion[] = [];
  if (check.kind === 'measure' && step.verdict !== null) {
    questions.push({ asked: 'verdict', prompt: 'What is the verdict on this reading?', choices: verdictChoices(check, step.verdict), expected: step.verdict });
  }
  if (!step.retracted && step.nextCheckId !== null) {
    const targets = nextTargets(check);
    if (!targets.includes(step.nextCheckId)) targets.push(step.nextCheckId);
    if (targets.length > 1) {
      const choices = targets.map((id) => ({ value: id, label: checkOf(document, id)?.title ?? id }));
      questions.push({ asked: 'next_check', prompt: 'Which check comes next?', choices, expected: step.nextCheckId });
    }
  }
  return questions;
}

/** Scores an answer against the recorded step. Pure, so the server's scoring can be tested on its own. */
export function scorePracticeAnswer(document: ProcedureDocument, step: PracticeStep, asked: PracticeAsk, answer: string): PracticeScore {
  const question = practiceQuestions(document, step).find((q) => q.asked === asked);
  if (!question) {
    const what = asked === 'verdict' ? 'a verdict: it has no reading' : 'a next check: there is no choice to make there';
    return { ok: false, status: 409, code: 'no_such_question', message: `This step does not ask for ${what}.` };
  }
  if (!question.choices.some((c) => c.value === answer)) {
    return { ok: false, status: 400, code: 'not_a_choice', message: 'Pick one of the choices shown for this step.' };
  }
  const expectedLabel = question.choices.find((c) => c.value === question.expected)!.label;
  return { ok: true, correct: answer === question.expected, expected: question.expected, expectedLabel, explanation: explain(document, step, asked) };
}

/** The verdicts this check's reading could have had, in the engine's order, with the recorded one. */
function verdictChoices(check: MeasureCheck, recorded: Verdict): PracticeChoice[] {
  const possible = new Set<Verdict>(requiredVerdicts(check, 'branch'));
  possible.add(recorded);
  return VERDICTS.filter((v) => possible.has(v)).map((v) => ({ value: v, label: VERDICT_WORDS[v] }));
}

/** Distinct checks a check's outcomes lead to, in the order the procedure lists them. */
function nextTargets(check: Check): string[] {
  switch (check.kind) {
    case 'measure':
      return [...new Set(Object.values(check.outcomes).filter((t): t is string => t !== undefined))];
    case 'observe':
      return [...new Set(check.choices.map((c) => c.next))];
    case 'task':
      return [check.next];
    case 'finding':
      return [];
  }
}

const READING_PHRASE: Record<Verdict, string> = {
  in_spec: 'An in-spec reading',
  low: 'A low reading',
  high: 'A high reading',
  open: 'An open circuit',
  marginal: 'A marginal reading',
  no_reading: 'No reading',
};

function explain(document: ProcedureDocument, step: PracticeStep, asked: PracticeAsk): string {
  const check = checkOf(document, step.checkId)!;
  if (asked === 'verdict' && check.kind === 'measure' && step.evaluation) {
    return explainEvaluation(check.spec, step.evaluation, check.quantity);
  }
  const title = (id: string | null) => `“${checkOf(document, id)?.title ?? id}”`;
  const { cause, target } = followed(document, check, step);
  if (target === null || target === step.nextCheckId) return `${cause} leads to ${title(step.nextCheckId)}.`;
  const retested = checkOf(document, target);
  const visits = retested && 'retest' in retested && retested.retest ? retested.retest.maxVisits : 0;
  return `${cause} leads to ${title(target)}, which had already run ${visits} time${visits === 1 ? '' : 's'}, so the procedure goes on to ${title(step.nextCheckId)}.`;
}

/** Why the path went where it did: the outcome taken and the check it names. */
function followed(document: ProcedureDocument, check: Check, step: PracticeStep): { cause: string; target: string | null } {
  if (check.kind === 'observe') {
    const choice = check.choices.find((c) => c.id === step.choiceId);
    return { cause: choice ? `“${choice.label}”` : 'The observation', target: choice?.next ?? null };
  }
  if (check.kind === 'task') return { cause: 'Once the task is done, it', target: check.next };
  if (check.kind === 'measure' && step.verdict !== null) {
    let via: Verdict = step.verdict;
    const policy = marginalPolicyOf(check, document);
    if (via === 'marginal' && policy === 'pass') via = 'in_spec';
    else if (via === 'marginal' && policy === 'fail' && step.evaluation?.leans) via = step.evaluation.leans;
    const cause = via === step.verdict ? READING_PHRASE[via] : `A marginal reading, treated as ${VERDICT_WORDS[via].toLowerCase()},`;
    return { cause, target: check.outcomes[via] ?? null };
  }
  return { cause: 'This step', target: null };
}
