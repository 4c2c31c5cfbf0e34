/**
 * New passwords must not be common or trivial: zxcvbn-ts estimates how many guesses a password
 * takes (dictionaries of common passwords, names and words, keyboard patterns, repeats,
 * sequences, dates) and says why a weak one is weak. Score 3 of 4 or better is required
 * ("safely unguessable: moderate protection from an offline slow-hash attack" in zxcvbn's scale).
 */
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { HttpError } from '../errors';

export const MIN_PASSWORD_SCORE = 3;

/** Our own words for the estimator's findings (it ships keys; the language packs are not used). */
const translations = {
  warnings: {
    straightRow: 'it is a straight row of keys',
    keyPattern: 'it is a short keyboard pattern',
    simpleRepeat: 'it repeats one character',
    extendedRepeat: 'it repeats a group of characters',
    sequences: 'it is a sequence like abc or 6543',
    recentYears: 'it is a recent year',
    dates: 'it is a date',
    topTen: 'it is one of the ten most used passwords',
    topHundred: 'it is one of the hundred most used passwords',
    common: 'it is a commonly used password',
    similarToCommon: 'it is close to a commonly used password',
    wordByItself: 'it is a single word',
    namesByThemselves: 'it is a name',
    commonNames: 'it is a common name',
    userInputs: 'it uses your name or e-mail address',
    pwned: 'it has appeared in leaked password lists',
  },
  suggestions: {
    l33t: 'Swapping letters for look-alike digits does not help much.',
    reverseWords: 'A word written backwards does not help much.',
    allUppercase: 'Capitals throughout do not help much.',
    capitalization: 'A capital first letter does not help much.',
    dates: 'Leave out dates that belong to you.',
    recentYears: 'Leave out recent years.',
    associatedYears: 'Leave out years that belong to you.',
    sequences: 'Leave out sequences.',
    repeated: 'Leave out repeated words and characters.',
    longerKeyboardPattern: 'Use a longer pattern with more turns.',
    anotherWord: 'Add more words, less common ones.',
    useWords: 'Use a few unrelated words.',
    noNeed: 'Symbols, digits and capitals are not needed.',
    pwned: 'Choose a password you have not used elsewhere.',
  },
  timeEstimation: {
    ltSecond: 'less than a second', second: '{base} second', seconds: '{base} seconds', minute: '{base} minute', minutes: '{base} minutes',
    hour: '{base} hour', hours: '{base} hours', day: '{base} day', days: '{base} days', month: '{base} month', months: '{base} months',
    year: '{base} year', years: '{base} years', centuries: 'centuries',
  },
};

let checker: ZxcvbnFactory | null = null;
const zxcvbn = () => (checker ??= new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs, useLevenshteinDistance: true, translations }));

/** Plain words on why a password is too easy to guess, or null when it is strong enough. */
export function passwordWeakness(password: string, userInputs: readonly string[] = []): string | null {
  if (password.trim().length === 0) return 'A password of spaces only is too easy to guess.';
  const result = zxcvbn().check(password, [...userInputs]);
  if (result.score >= MIN_PASSWORD_SCORE) return null;
  const why = result.feedback.warning;
  const hint = result.feedback.suggestions[0];
  return [`This password is too easy to guess${why ? `: ${why}` : ''}.`, hint ?? 'Use a few unrelated words or a longer password.'].join(' ');
}

/** Throws 400 WEAK_PASSWORD, with the reason on the `password` field, for a weak password. */
export function assertStrongPassword(password: string, userInputs: readonly string[] = []): void {
  const weakness = passwordWeakness(password, userInputs);
  if (weakness) throw new HttpError(400, 'WEAK_PASSWORD', weakness, [{ path: ['password'], message: weakness }]);
}
