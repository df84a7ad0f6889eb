import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';

/**
 * Password strength with zxcvbn-ts (dictionaries of common passwords, names, words, keyboard
 * patterns, repeats and sequences). Score 0–4; 3 means "safely unguessable: moderate protection
 * from an offline slow-hash scenario" (zxcvbn's own scale), which we require.
 */
export const MIN_PASSWORD_SCORE = 3;

let estimator: ZxcvbnFactory | undefined;
const zxcvbn = () =>
  (estimator ??= new ZxcvbnFactory({
    translations: english.translations,
    graphs: common.adjacencyGraphs,
    dictionary: { ...common.dictionary, ...english.dictionary, slotwise: ['slotwise', 'harborlane', 'tslot', 'extrusion', 'aluminium', 'aluminum'] },
  }));

/** Why the password is too easy to guess, or null when it is strong enough. `related` are the account's own words (email, name). */
export function weakPasswordReason(password: string, related: string[] = []): string | null {
  const result = zxcvbn().check(password.slice(0, 72), related.filter(Boolean));
  if (result.score >= MIN_PASSWORD_SCORE) return null;
  const why = result.feedback.warning ? `${result.feedback.warning.replace(/\.$/, '')}.` : 'It would be guessed quickly.';
  const tip = result.feedback.suggestions[0] ?? 'Use a few unrelated words together.';
  return `This password is too easy to guess. ${why} ${tip}`;
}
