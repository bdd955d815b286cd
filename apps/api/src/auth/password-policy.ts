import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';

/** zxcvbn score a new password must reach (0–4). */
export const minimumPasswordScore = 3;

let checker: ZxcvbnFactory | undefined;

// Building the dictionaries takes a few hundred milliseconds, so the checker is built once and kept.
function passwordChecker(): ZxcvbnFactory {
  checker ??= new ZxcvbnFactory({
    dictionary: { ...common.dictionary, ...english.dictionary },
    graphs: common.adjacencyGraphs,
    translations: english.translations,
  });
  return checker;
}

/**
 * Why a new password is too weak, or null when it is strong enough. `userInputs` (e-mail, name) count as
 * guessable words; the e-mail's local part and the name's words are added separately.
 */
export function passwordWeakness(password: string, userInputs: string[]): string | null {
  const words = userInputs.flatMap((input) => [input, ...input.split(/[@\s.,_-]+/)]).filter((w) => w.length >= 3);
  const result = passwordChecker().check(password, words);
  if (result.score >= minimumPasswordScore) return null;
  const hints = [result.feedback.warning, ...result.feedback.suggestions].filter((h): h is string => Boolean(h));
  const why = 'This password is too easy to guess.';
  return hints.length > 0 ? `${why} ${hints.join(' ')}` : `${why} Add more words or characters that do not belong together.`;
}
