import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';
import { ValidationError } from './errors.js';

/*
 * Length alone lets "password123" and "qwertyuiop" through. Every new password is also scored
 * by zxcvbn-ts against its lists of common passwords, names, words and keyboard patterns, and
 * against the person's own e-mail, name and workshop. A score of 3 of 4 ("safely unguessable")
 * is the bar zxcvbn's authors suggest for accounts like these (common practice).
 */

export const MIN_SCORE = 3;

let factory: ZxcvbnFactory | null = null;

/** The dictionaries take about half a second to load: once, on first use. */
function checker(): ZxcvbnFactory {
  factory ??= new ZxcvbnFactory({
    translations: english.translations,
    graphs: common.adjacencyGraphs,
    dictionary: { ...common.dictionary, ...english.dictionary },
  });
  return factory;
}

/** Why the password is too easy to guess, in words for the person; null when it is strong. */
export async function weakPasswordReason(
  password: string,
  personal: readonly string[] = [],
): Promise<string | null> {
  const words = personal.flatMap((p) => {
    const whole = p.toLowerCase();
    return [whole, whole.split('@')[0], ...whole.split(/[^\p{L}\p{N}]+/u)];
  });
  const result = await checker().checkAsync(password, [...new Set(words.filter(Boolean))]);
  if (result.score >= MIN_SCORE) return null;
  const because = result.feedback.warning ? `${result.feedback.warning} ` : '';
  const hint = result.feedback.suggestions[0] ?? 'Add a few more unusual words.';
  return `This password is too easy to guess. ${because}${hint}`;
}

/** Refuses a weak password, the message on the field that holds it. */
export async function assertStrongPassword(
  password: string,
  field: string,
  personal: readonly string[],
): Promise<void> {
  const reason = await weakPasswordReason(password, personal);
  if (reason) throw new ValidationError([{ field, message: reason }]);
}
