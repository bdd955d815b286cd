import { Injectable } from '@angular/core';

/** A strength score from 0 (guessable) to 4 (very hard to guess) with zxcvbn's advice. */
export interface PasswordStrength {
  readonly score: 0 | 1 | 2 | 3 | 4;
  readonly warning: string;
  readonly suggestions: readonly string[];
}

type Checker = (password: string, userInputs: string[]) => PasswordStrength;

/**
 * Scores passwords with zxcvbn-ts. The dictionaries are large, so they are loaded only when a
 * password page first asks, and the checker is built once (building takes a few hundred ms).
 */
@Injectable({ providedIn: 'root' })
export class PasswordStrengthService {
  private checker: Promise<Checker> | null = null;

  score(password: string, userInputs: string[] = []): Promise<PasswordStrength> {
    this.checker ??= this.load();
    return this.checker.then((check) => check(password, userInputs));
  }

  private async load(): Promise<Checker> {
    const [core, common, english] = await Promise.all([
      import('@zxcvbn-ts/core'),
      import('@zxcvbn-ts/language-common'),
      import('@zxcvbn-ts/language-en'),
    ]);
    const factory = new core.ZxcvbnFactory({
      dictionary: { ...common.dictionary, ...english.dictionary },
      graphs: common.adjacencyGraphs,
      translations: english.translations,
    });
    return (password, userInputs) => {
      const result = factory.check(password, userInputs);
      return {
        score: result.score,
        warning: result.feedback.warning ?? '',
        suggestions: result.feedback.suggestions,
      };
    };
  }
}
