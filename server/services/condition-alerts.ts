import type { Config } from '../config.js';
import type { Store } from '../db/store.js';
import type { Mailer } from '../mail/mailer.js';
import { conditionAlertMail } from '../mail/templates.js';

/**
 * E-mails every active curator and conservator (but the one who acted) about an incident or a critical finding. Runs after the commit;
 * a mail server that fails is logged and does not undo what was recorded.
 */
export class ConditionAlerts {
  constructor(private readonly store: Store, private readonly mailer: Mailer, private readonly config: Config) {}

  async tellKeepers(subject: string, lines: string[], path: string, exceptUserId: number | null = null): Promise<void> {
    const users = this.store.repos.users;
    const keepers = [...(await users.activeWithRole('curator')), ...(await users.activeWithRole('conservator'))].filter((u) => u.id !== exceptUserId);
    const settings = await this.store.repos.settings.get();
    for (const curator of keepers) {
      const mail = conditionAlertMail({ to: curator.email, name: curator.name, subject, lines, url: `${this.config.publicUrl}${path}`, organisationName: settings.organisationName });
      await this.mailer.send(mail).catch((err: unknown) => console.error(`Could not send "${subject}" to ${curator.email}:`, err instanceof Error ? err.message : err));
    }
  }
}
