import { describe, expect, it } from 'vitest';
import { actions, can, roles } from './permissions';

// Expected answers are PRODUCT.md's role table ("Who uses it"), a product rule rather than a computation.
const table: Record<(typeof actions)[number], Record<(typeof roles)[number], boolean>> = {
  'restoration.view': { technician: true, mentor: true, owner: true },
  'restoration.edit': { technician: true, mentor: false, owner: false },
  'restoration.delete': { technician: true, mentor: false, owner: false },
  'members.view': { technician: true, mentor: true, owner: true },
  'members.manage': { technician: true, mentor: false, owner: false },
};

describe('can()', () => {
  for (const action of actions)
    for (const role of roles)
      it(`when a ${role} asks for ${action}, then the answer is ${table[action][role]}`, () => {
        expect(can(role, action)).toBe(table[action][role]);
      });

  it('when the person holds no role, then nothing is allowed', () => {
    for (const action of actions) expect(can(null, action)).toBe(false);
  });
});
