import { describe, expect, it } from 'vitest';
import { can, permissionsFor, type Action, type Resource } from '../../shared/permissions.js';
import { ROLES, type Role } from '../../shared/roles.js';

// Who may do what, as BRIEF.md assigns the roles; one row per resource and action.
const MATRIX: Record<string, Record<Role, boolean>> = {
  'vessel.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'vessel.create': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'vessel.update': { admin: true, curator: true, conservator: false, docent: false, fundraiser: false },
  'vessel.archive': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'user.read': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'user.update': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'user.deactivate': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'user.reactivate': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'invitation.read': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'invitation.create': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'invitation.resend': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'invitation.revoke': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'auditEvent.read': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'settings.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'settings.update': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'outbox.read': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  // The administrator is responsible for backups.
  'backup.read': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  'backup.create': { admin: true, curator: false, conservator: false, docent: false, fundraiser: false },
  // The ship map: curators edit it, conservators keep the hazard registers, every staff role reads.
  'deck.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'deck.create': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'deck.update': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'deck.delete': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'compartment.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'compartment.create': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'compartment.update': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'compartment.delete': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'hazard.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'hazard.create': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'hazard.update': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'hazard.delete': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  // The collection: curators keep the records; every staff role reads and may export.
  'artifact.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'artifact.create': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'artifact.update': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'artifact.move': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'artifact.archive': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'artifact.import': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  // Condition: conservators write, curators read everything and may submit, others read summaries.
  'conditionReport.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'conditionReport.readFindings': { admin: true, curator: true, conservator: true, docent: false, fundraiser: false },
  'conditionReport.create': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'conditionReport.update': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'conditionReport.delete': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'conditionReport.submit': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'conditionReport.amend': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'risk.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'risk.create': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'risk.update': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  'risk.delete': { admin: false, curator: false, conservator: true, docent: false, fundraiser: false },
  // Giving: fundraisers run appeals and gifts; donor e-mails, refunds and exports stay with them and the administrator.
  'appeal.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'appeal.update': { admin: true, curator: true, conservator: false, docent: false, fundraiser: true },
  'donation.read': { admin: true, curator: true, conservator: false, docent: false, fundraiser: true },
  'donation.readDonor': { admin: true, curator: false, conservator: false, docent: false, fundraiser: true },
  'donation.refund': { admin: true, curator: false, conservator: false, docent: false, fundraiser: true },
  'donation.export': { admin: true, curator: false, conservator: false, docent: false, fundraiser: true },
  'incident.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'incident.create': { admin: false, curator: true, conservator: true, docent: true, fundraiser: false },
  'incident.update': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  // Tours: docents write and submit, curators publish; every staff role reads.
  'tour.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'tour.create': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'tour.update': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'tour.submit': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'tour.comment': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'tour.approve': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'tour.return': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'tour.retire': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  // Repairs: curators and conservators plan them (approving is the curator's, in the service); fundraisers and all staff read.
  'repairProject.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'repairProject.create': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'repairProject.update': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'repairProject.changeStatus': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'treatment.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'treatment.create': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'treatment.update': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  // Files: curators and conservators, further limited to records their role may change (media.presenter.ts).
  'media.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'media.create': { admin: false, curator: true, conservator: true, docent: true, fundraiser: false },
  'media.update': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  'media.delete': { admin: false, curator: true, conservator: true, docent: false, fundraiser: false },
  // Interpretation: docents write and submit; only a curator approves (publishes) or returns it.
  'interpretation.read': { admin: true, curator: true, conservator: true, docent: true, fundraiser: true },
  'interpretation.update': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'interpretation.submit': { admin: false, curator: true, conservator: false, docent: true, fundraiser: false },
  'interpretation.approve': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
  'interpretation.return': { admin: false, curator: true, conservator: false, docent: false, fundraiser: false },
};

describe('permissions', () => {
  for (const [key, expected] of Object.entries(MATRIX)) {
    const [resource, action] = key.split('.') as [Resource, Action];
    it.each(ROLES)(`${key} for %s`, (role) => {
      expect(can(role, resource, action as never)).toBe(expected[role]);
    });
  }

  it('the matrix above covers every declared permission', () => {
    const declared = ROLES.flatMap((role) => Object.entries(permissionsFor(role)).flatMap(([r, actions]) => actions.map((a) => `${r}.${a}`)));
    for (const key of declared) expect(Object.keys(MATRIX)).toContain(key);
  });

  it('nobody without a role may do anything', () => {
    expect(can(null, 'vessel', 'read')).toBe(false);
    expect(can(undefined, 'settings', 'read')).toBe(false);
  });
});
