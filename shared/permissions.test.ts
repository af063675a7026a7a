import { describe, expect, it } from 'vitest';
import { actions, can, roles, workshopRole } from './permissions';

// Expected answers are the product's own role rules (who may do what): a product decision, no outside source.
const table: Record<(typeof actions)[number], Record<(typeof roles)[number], boolean>> = {
  'restoration.view': { technician: true, mentor: true, owner: true },
  'restoration.edit': { technician: true, mentor: false, owner: false },
  'restoration.delete': { technician: true, mentor: false, owner: false },
  'members.view': { technician: true, mentor: true, owner: true },
  'members.manage': { technician: true, mentor: false, owner: false },
  // Without context a photo counts as not shared, so owners may not see it.
  'photos.view': { technician: true, mentor: true, owner: false },
  'photos.upload': { technician: true, mentor: false, owner: false },
  'photos.edit': { technician: true, mentor: false, owner: false },
  'photos.delete': { technician: true, mentor: false, owner: false },
  'photos.original': { technician: true, mentor: false, owner: false },
  'findings.view': { technician: true, mentor: true, owner: false },
  'findings.create': { technician: true, mentor: true, owner: false },
  'findings.edit': { technician: true, mentor: false, owner: false },
  'findings.delete': { technician: true, mentor: false, owner: false },
  'findings.share': { technician: true, mentor: false, owner: false },
  'findings.ask': { technician: true, mentor: false, owner: false },
  'findings.resolve': { technician: true, mentor: true, owner: false },
  'comments.create': { technician: true, mentor: true, owner: false },
  'comments.internal': { technician: true, mentor: true, owner: false },
  'comments.edit': { technician: false, mentor: false, owner: false },
  'comments.delete': { technician: true, mentor: false, owner: false },
  'measurements.view': { technician: true, mentor: true, owner: false },
  'measurements.record': { technician: true, mentor: false, owner: false },
  'parts.view': { technician: true, mentor: true, owner: true },
  'parts.edit': { technician: true, mentor: false, owner: false },
  'parts.costs': { technician: true, mentor: false, owner: false },
  'report.download': { technician: true, mentor: true, owner: true },
  'report.send': { technician: true, mentor: false, owner: false },
  'workshop.view': { technician: true, mentor: true, owner: false },
  'workshop.notes': { technician: true, mentor: true, owner: false },
  'safety.view': { technician: true, mentor: true, owner: true },
  'safety.record': { technician: true, mentor: false, owner: false },
  'safety.override': { technician: true, mentor: false, owner: false },
  'bringup.view': { technician: true, mentor: true, owner: true },
  'bringup.record': { technician: true, mentor: false, owner: false },
  'bringup.signoff': { technician: true, mentor: false, owner: false },
  // Without context a sheet page counts as not shared, so owners may not see it.
  'sheets.view': { technician: true, mentor: true, owner: false },
  'sheets.upload': { technician: true, mentor: false, owner: false },
  'sheets.edit': { technician: true, mentor: false, owner: false },
  'references.mark': { technician: true, mentor: false, owner: false },
  'help.view': { technician: true, mentor: true, owner: false },
  'help.ask': { technician: true, mentor: false, owner: false },
  // Mentors see no money; owners read their own sets' estimates and answer them.
  'money.view': { technician: true, mentor: false, owner: true },
  'money.edit': { technician: true, mentor: false, owner: false },
  'estimates.decide': { technician: false, mentor: false, owner: true },
  'labour.record': { technician: true, mentor: false, owner: false },
  'settings.view': { technician: true, mentor: false, owner: false },
  'settings.edit': { technician: true, mentor: false, owner: false },
  // Owners pay their own invoices by card; technicians may too (at the counter), and alone record transfers, cash and refunds.
  'payments.checkout': { technician: true, mentor: false, owner: true },
  'payments.record': { technician: true, mentor: false, owner: false },
};

describe('can()', () => {
  for (const action of actions)
    for (const role of roles)
      it(`when a ${role} asks for ${action}, then the answer is ${table[action][role]}`, () => {
        expect(can(role, action)).toBe(table[action][role]);
      });

  it('when a photo is shared with the owner, then the owner may see it', () => {
    expect(can('owner', 'photos.view', { ownerVisible: true })).toBe(true);
    expect(can('owner', 'photos.view', { ownerVisible: false })).toBe(false);
  });

  it("when a mentor placed a finding, then they may change it; others' they may not", () => {
    expect(can('mentor', 'findings.edit', { isAuthor: true })).toBe(true);
    expect(can('mentor', 'findings.delete', { isAuthor: false })).toBe(false);
    expect(can('owner', 'findings.edit', { isAuthor: true })).toBe(false);
  });

  it("when a comment is someone's own, then they may edit it; technicians may also delete others'", () => {
    expect(can('owner', 'comments.edit', { isAuthor: true })).toBe(true);
    expect(can('technician', 'comments.edit', { isAuthor: false })).toBe(false);
    expect(can('technician', 'comments.delete', { isAuthor: false })).toBe(true);
  });

  it('when the person holds no role, then nothing is allowed', () => {
    for (const action of actions) expect(can(null, action)).toBe(false);
  });

  it('when a person holds roles on several sets, then their workshop role is the first of technician, mentor, owner they hold', () => {
    expect(workshopRole(['owner', 'technician'])).toBe('technician');
    expect(workshopRole(['owner', 'mentor'])).toBe('mentor');
    expect(workshopRole(['owner'])).toBe('owner');
    expect(workshopRole([])).toBeNull();
  });
});
