import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { PASSWORD_MIN } from '../../../shared/schemas/auth';
import { BadRequestError } from '../../http/errors';

const common = new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));
const estimator = new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });

/**
 * zxcvbn's score runs 0–4; 3 means "safely unguessable" against an offline attack on a slow hash.
 * Below it are repeats ("aaaaaaaaaaaa"), sequences ("1234567890", "abcdefghijkl"), keyboard walks and
 * dictionary words with small changes.
 */
export const MIN_STRENGTH_SCORE = 3;

/** True for the most common passwords (the zxcvbn-ts common list, about 49,000 entries). */
export function isCommonPassword(password: string): boolean {
  return common.has(password.toLowerCase());
}

/**
 * zxcvbn-ts's estimate (0–4) with the common-password list, keyboard layouts and dictionaries. The
 * person's own name and address count as known words, whole and in parts ("mara", "quillfeather").
 */
export function passwordScore(password: string, userInputs: string[] = []): number {
  const words = userInputs.flatMap((input) => [input, ...input.split(/[\s@._+-]+/)]).filter((w) => w.length >= 3);
  return estimator.check(password, words).score;
}

/** Refuses the common-password list and anything the estimate finds easy (repeats, sequences, walks). */
export function assertStrongPassword(password: string, userInputs: string[] = []) {
  if (isCommonPassword(password))
    throw new BadRequestError('That password is among the most common ones; choose another.', [
      {
        location: 'body',
        path: 'password',
        message: `That password is among the most common ones; use ${PASSWORD_MIN}+ characters of your own.`,
      },
    ]);
  if (passwordScore(password, userInputs) < MIN_STRENGTH_SCORE)
    throw new BadRequestError(
      'That password is too easy to guess (a repeat, a sequence or a keyboard pattern); choose another.',
      [
        {
          location: 'body',
          path: 'password',
          message: 'Too easy to guess: avoid repeats and sequences; a few unrelated words work well.',
        },
      ],
    );
}
