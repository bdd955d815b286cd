import type { ReductionView, ResultSheet, Role, Run, Submission } from '@tunnelwright/contracts';

/** Who is looking: enough to tell what they may do with a submission. */
export interface Caller {
  readonly id: string;
  readonly role: Role;
  /** Whether they hold a signing right now. */
  readonly holdsSigningRight: boolean;
}

/**
 * Why the caller may not approve or send back this submission, in plain words, or null when they may.
 * The server decides in the end; this only spares people a button that would be refused.
 */
export function decisionBlock(submission: Pick<Submission, 'state' | 'reductions' | 'submittedBy'>, caller: Caller): string | null {
  if (submission.state !== 'awaiting_approval') {
    return 'This submission has already been decided.';
  }
  if (caller.role !== 'analyst') {
    return 'Only an analyst holding a signing right approves or sends back a submission.';
  }
  if (!caller.holdsSigningRight) {
    return 'You hold no signing right, so you cannot approve or send back. A lab manager grants signing rights.';
  }
  const own = submission.reductions.filter((reduction) => reduction.uploadedBy.id === caller.id).map((reduction) => reduction.runNumber);
  if (own.length > 0) {
    const runs = [...new Set(own)].sort((a, b) => a - b);
    const list = runs.length === 1 ? `run ${runs[0]}` : `runs ${runs.slice(0, -1).join(', ')} and ${runs[runs.length - 1]}`;
    return `You uploaded the raw file of ${list}, so a second person must check it: another analyst with a signing right decides.`;
  }
  if (submission.submittedBy.id === caller.id) {
    return 'You submitted these results, so a second person must check them: another analyst with a signing right decides.';
  }
  return null;
}

/**
 * Why the caller may not issue the sheet of this submission, or null when they may. `others` are the test's
 * submissions: results approved after these replace them, so only the newest approved ones can be issued.
 */
export function issueBlock(submission: Pick<Submission, 'state' | 'sheet' | 'sequence'>, caller: Caller, others: readonly Pick<Submission, 'state' | 'sequence'>[] = []): string | null {
  if (submission.state !== 'approved') {
    return 'Only an approved submission can be issued.';
  }
  if (submission.sheet) {
    return `Already issued as ${submission.sheet.reportNumber}.`;
  }
  const newer = others.filter((other) => other.state === 'approved' && other.sequence > submission.sequence).sort((a, b) => a.sequence - b.sequence)[0];
  if (newer) {
    return `Submission ${newer.sequence} was approved after this one, so its results are the ones to issue.`;
  }
  if (caller.role === 'lab_manager' || (caller.role === 'analyst' && caller.holdsSigningRight)) {
    return null;
  }
  return caller.role === 'analyst'
    ? 'You hold no signing right, so you cannot issue the result sheet.'
    : 'A lab manager, or an analyst holding a signing right, issues the result sheet.';
}

/** Whether a new sheet would be a revision, which must say why: the test already has a valid sheet. */
export function isRevision(sheets: readonly Pick<ResultSheet, 'state'>[]): boolean {
  return sheets.some((sheet) => sheet.state === 'valid');
}

/** One run with the reduction versions that can be submitted (done ones, newest first). */
export interface RunChoice {
  readonly run: Pick<Run, 'id' | 'runNumber' | 'kind' | 'configurationLabel'>;
  readonly versions: readonly Pick<ReductionView, 'id' | 'version' | 'pointCount' | 'state' | 'createdAt'>[];
}

/** Keeps only done versions, newest first, and drops runs with none (nothing of theirs can be submitted). */
export function runChoices(runs: readonly { run: RunChoice['run']; reductions: readonly RunChoice['versions'][number][] }[]): RunChoice[] {
  return runs
    .map(({ run, reductions }) => ({
      run,
      versions: reductions.filter((reduction) => reduction.state === 'done').sort((a, b) => b.version - a.version),
    }))
    .filter((choice) => choice.versions.length > 0)
    .sort((a, b) => a.run.runNumber - b.run.runNumber);
}

/** The default pick: the newest done version of every run, keyed by run id. */
export function defaultPicks(choices: readonly RunChoice[]): Record<string, string> {
  return Object.fromEntries(choices.map((choice) => [choice.run.id, choice.versions[0].id]));
}

/** Why the picks cannot be submitted, or null: something must be chosen, and calibration runs alone make no result. */
export function picksProblem(choices: readonly RunChoice[], picks: Readonly<Record<string, string>>): string | null {
  const chosen = choices.filter((choice) => (picks[choice.run.id] ?? '') !== '');
  if (chosen.length === 0) return 'Choose a version of at least one run.';
  if (!chosen.some((choice) => choice.run.kind === 'data')) return 'Choose at least one data run; calibration runs alone make no result.';
  return null;
}

/** The reduction ids to send, one per run, leaving out runs set to `''` (left out of the submission). */
export function pickedReductionIds(picks: Readonly<Record<string, string>>): string[] {
  return Object.values(picks).filter((id) => id !== '');
}
