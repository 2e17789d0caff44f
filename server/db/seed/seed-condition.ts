import type { DataSource } from 'typeorm';
import { daysAgo } from '../../../shared/calc/days.js';
import type { Config } from '../../config.js';
import type { ConditionAlerts } from '../../services/condition-alerts.js';
import { ConditionReportService } from '../../services/condition-report.service.js';
import { IncidentService } from '../../services/incident.service.js';
import { RiskService } from '../../services/risk.service.js';
import { FileStore } from '../../storage/file-store.js';
import { Store } from '../store.js';
import { DEMO_INCIDENTS, DEMO_REPORTS, DEMO_RISKS } from './demo-condition.js';


/** The demo seeds no mail: nobody needs alerts about invented events. */
const quiet = { tellKeepers: async () => undefined } as unknown as ConditionAlerts;

/**
 * Condition reports over four years, two incidents (one that closed a space) and a risk register,
 * written through the same services as the screens use. Runs after the collection.
 */
export async function seedDemoCondition(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const reports = new ConditionReportService(store, quiet, new FileStore(config.uploadsDir));
  const incidents = new IncidentService(store, reports, quiet);
  const risks = new RiskService(store);
  const person = async (email: string) => {
    const user = (await store.repos.users.findByEmail(email))!;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  };
  const conservator = await person('conservator@shipkeeper.test');
  const curator = await person('curator@shipkeeper.test');
  const actor = { id: conservator.id, ip: null };
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const rooms = new Map((await store.repos.compartments.page(vessel.id, { page: 1, pageSize: 100, sort: 'designation' })).items.map((c) => [c.designation, c.id]));
  const artifactId = async (number: string) => (await store.repos.artifacts.findByNumber(vessel.id, number))!.id;
  const subjectOf = async (key: string) => (rooms.has(key) ? { subjectType: 'compartment' as const, subjectId: rooms.get(key)! } : { subjectType: 'artifact' as const, subjectId: await artifactId(key) });

  for (const demo of DEMO_REPORTS) {
    const subject = await subjectOf(demo.subject);
    let report = await reports.create({ ...subject, inspectedOn: daysAgo(demo.daysAgo), method: 'close-visual', temperatureC: demo.temperature ?? null, relativeHumidity: demo.humidity ?? null, summary: demo.summary }, conservator, actor);
    for (const f of demo.findings) {
      report = await reports.addFinding(
        report.id,
        {
          artifactId: f.artifact ? await artifactId(f.artifact) : null,
          agent: f.agent,
          damageType: f.damageType,
          location: null,
          extentPercent: f.extent ?? null,
          severity: f.severity,
          percentRusted: f.rust?.[0] ?? null,
          rustDistribution: f.rust?.[1] ?? null,
          description: f.description,
          recommendedAction: f.action,
          urgency: f.urgency ?? 'routine',
        },
        conservator,
        actor,
      );
    }
    if (demo.draft) continue;
    report = await reports.submit(report.id, report.version, conservator, actor);
    if (demo.amendTo) {
      const amendment = await reports.amend(report.id, conservator, actor);
      const first = amendment.findings![0]!;
      const fixed = await reports.updateFinding(amendment.id, first.id, { severity: demo.amendTo, version: first.version }, conservator, actor);
      await reports.update(amendment.id, { summary: `${demo.summary} Amended: the staining hides active corrosion.`, version: fixed.version }, conservator, actor);
      const latest = await reports.get(amendment.id, conservator);
      await reports.submit(amendment.id, latest.version, curator, { id: curator.id, ip: null });
    }
  }

  for (const demo of DEMO_INCIDENTS) {
    await incidents.create(
      {
        vesselId: vessel.id,
        kind: demo.kind,
        title: demo.title,
        foundOn: daysAgo(demo.daysAgo),
        occurredOn: null,
        description: demo.description,
        reportedTo: demo.reportedTo,
        policeReference: demo.policeReference,
        actionsTaken: demo.actions,
        artifactIds: await Promise.all(demo.artifacts.map(artifactId)),
        compartmentIds: demo.compartments.map((d) => rooms.get(d)!),
        closeCompartmentIds: demo.close.map((d) => rooms.get(d)!),
        publicNote: demo.publicNote,
        severity: demo.severity,
      },
      curator,
      { id: curator.id, ip: null },
    );
  }

  for (const demo of DEMO_RISKS) {
    await risks.create(
      {
        vesselId: vessel.id,
        statement: demo.statement,
        agent: demo.agent,
        status: demo.status ?? 'open',
        a: demo.scores.a ?? null,
        b: demo.scores.b ?? null,
        c: demo.scores.c ?? null,
        yearsBetween: demo.scores.yearsBetween ?? null,
        lossPerItemPercent: demo.scores.lossPerItemPercent ?? null,
        assetFractionPercent: demo.scores.assetFractionPercent ?? null,
        artifactIds: await Promise.all((demo.artifacts ?? []).map(artifactId)),
        compartmentIds: demo.compartments.map((d) => rooms.get(d)!),
        notes: '',
      },
      conservator,
      actor,
    );
  }
}
