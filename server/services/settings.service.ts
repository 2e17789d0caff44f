import { scoreA, scoreB, scoreC } from '../../shared/calc/abc-risk.js';
import type { UpdateSettingsBody } from '../../shared/schemas/settings.js';
import type { Store } from '../db/store.js';
import { StaleVersionError } from '../http/errors.js';
import { presentSettings } from '../presenters/settings.presenter.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';

export class SettingsService {
  constructor(private readonly store: Store) {}

  async get() {
    return presentSettings(await this.store.repos.settings.get());
  }

  async update(body: UpdateSettingsBody, actor: Actor) {
    const saved = await this.store.transaction(async (repos) => {
      const settings = await repos.settings.get();
      if (settings.version !== body.version) {
        throw new StaleVersionError('the settings', settings.version, 'them');
      }
      const { version: _version, ...fields } = body;
      const changes = changesBetween(settings, fields, ['organisationName', 'country', 'currency', 'unitSystem', 'contactEmail', 'objectNumberPattern', 'riskScale', 'giving']);
      if (!changes) return settings;
      Object.assign(settings, fields);
      const saved = await repos.settings.save(settings);
      if (changes.riskScale) {
        // Scores from plain inputs follow the new anchors, and every band the new floors.
        const scale = settings.riskScale;
        for (const risk of await repos.risks.withPlainInputs()) {
          const a = risk.yearsBetween !== null ? scoreA(risk.yearsBetween, scale) : risk.a;
          const b = risk.lossPerItemPercent !== null ? scoreB(risk.lossPerItemPercent, scale) : risk.b;
          const c = risk.assetFractionPercent !== null ? scoreC(risk.assetFractionPercent, scale) : risk.c;
          if (a !== risk.a || b !== risk.b || c !== risk.c) await repos.risks.setScores(risk.id, { a, b, c, magnitude: a + b + c });
        }
        await repos.risks.rebandAll(scale);
      }
      await recordAudit(repos, actor, { action: 'update', entityType: 'settings', entityId: 1, summary: 'Organisation settings changed', changes });
      return saved;
    });
    return presentSettings(saved);
  }
}
