import type { AcceptInvitationBody, CreateInvitationBody, InspectInvitationResponse, InvitationsQuery } from '../../shared/schemas/invitations.js';
import { ROLE_LABELS } from '../../shared/roles.js';
import type { Config } from '../config.js';
import type { Repositories, Store } from '../db/store.js';
import type { InvitationEntity } from '../db/entities/invitation.entity.js';
import { hashPassword } from '../auth/password-hash.js';
import { passwordProblem } from '../auth/password-policy.js';
import { hashToken, newToken } from '../auth/tokens.js';
import { ApiError, ConflictError, NotFoundError, UnprocessableError, ValidationError } from '../http/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { invitationMail } from '../mail/templates.js';
import { invitationStatus, presentInvitation } from '../presenters/invitation.presenter.js';
import { recordAudit, type Actor } from './audit.service.js';

export class InvitationService {
  constructor(private readonly store: Store, private readonly mailer: Mailer, private readonly config: Config) {}

  private expiry(): Date {
    return new Date(Date.now() + this.config.invitationTtlHours * 3_600_000);
  }

  private async send(invitation: Pick<InvitationEntity, 'email' | 'name' | 'role' | 'expiresAt'>, token: string, invitedBy: string) {
    const { organisationName } = await this.store.repos.settings.get();
    await this.mailer.send(
      invitationMail({
        to: invitation.email,
        name: invitation.name,
        role: invitation.role,
        organisationName,
        invitedBy,
        url: `${this.config.publicUrl}/invitation#${token}`,
        expiresAt: invitation.expiresAt,
      }),
    );
  }

  async list(query: InvitationsQuery, viewer: Express.User) {
    const page = await this.store.repos.invitations.page(query, new Date());
    return { ...page, items: page.items.map((i) => presentInvitation(i, viewer)) };
  }

  private async refuseTaken(repos: Repositories, email: string) {
    const existing = await repos.users.findByEmail(email);
    if (existing?.status === 'deactivated') {
      throw new ConflictError('This address belongs to a deactivated account. Reactivate it on the People tab instead of inviting again.', { email: 'Belongs to a deactivated account.' });
    }
    if (existing) throw new ConflictError('Someone with this e-mail address already has an account.', { email: 'Already has an account.' });
    if (await repos.invitations.findOpenForEmail(email, new Date())) {
      throw new ConflictError('This person already has an open invitation. Resend it instead.', { email: 'Already invited.' });
    }
  }

  /**
   * Sends the invitation, then records it. Mail goes out before anything is written, so a failed
   * send keeps nothing, and no transaction waits on the mail server.
   */
  async create(body: CreateInvitationBody, viewer: Express.User, actor: Actor) {
    const { token, hash } = newToken();
    await this.refuseTaken(this.store.repos, body.email);
    const expiresAt = this.expiry();
    await this.send({ email: body.email, name: body.name, role: body.role, expiresAt }, token, viewer.name);
    const invitation = await this.store.transaction(async (repos) => {
      await this.refuseTaken(repos, body.email);
      const created = await repos.invitations.create({ ...body, tokenHash: hash, expiresAt, invitedById: viewer.id });
      await recordAudit(repos, actor, {
        action: 'invite',
        entityType: 'invitation',
        entityId: created.id,
        summary: `${body.email} invited as ${ROLE_LABELS[body.role]}`,
        changes: { email: { from: null, to: body.email }, role: { from: null, to: body.role } },
      });
      return created;
    });
    const saved = await this.store.repos.invitations.findById(invitation.id);
    return presentInvitation(saved!, viewer);
  }

  /** A new link (the old one stops working once the new one is sent) and a new expiry. */
  async resend(id: number, viewer: Express.User, actor: Actor) {
    const { token, hash } = newToken();
    const current = await this.store.repos.invitations.findById(id);
    if (!current) throw new NotFoundError('The invitation');
    const refuse = (status: string) => {
      if (status === 'accepted' || status === 'revoked') throw new UnprocessableError(`This invitation was ${status} and cannot be sent again.`);
    };
    refuse(invitationStatus(current));
    const expiresAt = this.expiry();
    await this.send({ ...current, expiresAt }, token, viewer.name);
    await this.store.transaction(async (repos) => {
      const invitation = await repos.invitations.findById(id);
      if (!invitation) throw new NotFoundError('The invitation');
      refuse(invitationStatus(invitation));
      invitation.tokenHash = hash;
      invitation.expiresAt = expiresAt;
      invitation.sentCount += 1;
      await repos.invitations.save(invitation);
      await recordAudit(repos, actor, { action: 'resend', entityType: 'invitation', entityId: id, summary: `Invitation to ${invitation.email} sent again` });
    });
    const saved = await this.store.repos.invitations.findById(id);
    return presentInvitation(saved!, viewer);
  }

  async revoke(id: number, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const invitation = await repos.invitations.findById(id);
      if (!invitation) throw new NotFoundError('The invitation');
      if (invitationStatus(invitation) !== 'pending') throw new UnprocessableError('Only a pending invitation can be revoked.');
      invitation.revokedAt = new Date();
      await repos.invitations.save(invitation);
      await recordAudit(repos, actor, { action: 'revoke', entityType: 'invitation', entityId: id, summary: `Invitation to ${invitation.email} revoked` });
    });
    const saved = await this.store.repos.invitations.findById(id);
    return presentInvitation(saved!, viewer);
  }

  private async findUsable(token: string) {
    const invitation = await this.store.repos.invitations.findByTokenHash(hashToken(token));
    if (!invitation) throw new ApiError(404, 'not_found', 'This invitation link is not valid. It may have been replaced by a newer one: use the latest e-mail, or ask for a new invitation.');
    return invitation;
  }

  async inspect(token: string): Promise<InspectInvitationResponse> {
    const invitation = await this.findUsable(token);
    const { organisationName } = await this.store.repos.settings.get();
    return {
      email: invitation.email,
      name: invitation.name,
      role: invitation.role,
      status: invitationStatus(invitation),
      expiresAt: invitation.expiresAt.toISOString(),
      organisationName,
    };
  }

  /** Creates the account; the invitation can be used once. */
  async accept(body: AcceptInvitationBody, ip: string | null): Promise<Express.User> {
    const invitation = await this.findUsable(body.token);
    const problem = passwordProblem(body.password, { email: invitation.email, name: body.name });
    if (problem) throw new ValidationError({ password: problem });
    const passwordHash = await hashPassword(body.password, this.config.bcryptCost);
    return this.store.transaction(async (repos) => {
      const fresh = await repos.invitations.findById(invitation.id);
      const status = fresh ? invitationStatus(fresh) : 'revoked';
      if (!fresh || status !== 'pending') {
        throw new UnprocessableError(
          status === 'accepted'
            ? 'This invitation has already been used. Sign in with the password you chose, or reset it.'
            : status === 'expired'
              ? 'This invitation has expired. Ask your administrator to send it again.'
              : 'This invitation was withdrawn. Ask your administrator if you still need an account.',
        );
      }
      if (await repos.users.findByEmail(fresh.email)) throw new ConflictError('Someone with this e-mail address already has an account.');
      const user = await repos.users.create({ email: fresh.email, name: body.name, role: fresh.role, passwordHash });
      fresh.acceptedAt = new Date();
      await repos.invitations.save(fresh);
      await recordAudit(repos, { id: user.id, ip }, {
        action: 'accept',
        entityType: 'invitation',
        entityId: fresh.id,
        summary: `${user.email} accepted the invitation and joined as ${ROLE_LABELS[user.role]}`,
      });
      return { id: user.id, email: user.email, name: user.name, role: user.role };
    });
  }
}
