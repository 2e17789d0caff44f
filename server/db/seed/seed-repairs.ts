import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';
import type { DataSource } from 'typeorm';
import { daysAgo } from '../../../shared/calc/days.js';
import type { Config } from '../../config.js';
import type { ConditionAlerts } from '../../services/condition-alerts.js';
import { ConditionReportService } from '../../services/condition-report.service.js';
import { MediaService } from '../../services/media.service.js';
import { RepairProjectService } from '../../services/repair-project.service.js';
import { TreatmentService } from '../../services/treatment.service.js';
import { FileStore } from '../../storage/file-store.js';
import { Store } from '../store.js';
import { demoPhoto } from './demo-photos.js';
import { DEMO_REPAIRS, DEMO_TREATMENT } from './demo-repairs.js';

const quiet = { tellKeepers: async () => undefined } as unknown as ConditionAlerts;

/** The gauge drawing of the demo photos, with two cracked glasses drawn over it for "before". */
async function gaugePhoto(stage: 'before' | 'after', takenAt: Date): Promise<Buffer> {
  const base = await demoPhoto('gauge', 2, takenAt);
  if (stage === 'after') return base;
  const cracks = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="900"><g stroke="#3a3a3a" stroke-width="6" fill="none" stroke-linecap="round"><path d="M 600 450 L 470 300 L 430 210 M 470 300 L 380 330 M 600 450 L 720 600 L 760 700 M 720 600 L 820 590"/><path d="M 600 450 L 690 260 M 600 450 L 470 560 L 420 640"/></g></svg>`;
  const stamp = takenAt.toISOString().slice(0, 19).replace('T', ' ').replace(/-/g, ':');
  return sharp(base).composite([{ input: Buffer.from(cracks) }]).jpeg({ quality: 82 }).withExif({ IFD0: { Software: 'Shipkeeper demo drawing' }, IFD2: { DateTimeOriginal: stamp } }).toBuffer();
}

/**
 * Three repair projects from the demo's findings, written through the same services as the screens
 * (two fundraising, one complete with a treatment, its photos and the survey after it); the dates of
 * their status changes are then set back to the demo's timeline. Runs after the condition seed.
 */
export async function seedDemoRepairs(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const files = new FileStore(config.uploadsDir);
  const projects = new RepairProjectService(store);
  const treatments = new TreatmentService(store);
  const reports = new ConditionReportService(store, quiet, files);
  const media = new MediaService(store, files);
  const person = async (email: string) => {
    const user = (await store.repos.users.findByEmail(email))!;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  };
  const people = { curator: await person('curator@shipkeeper.test'), conservator: await person('conservator@shipkeeper.test') };
  const actorOf = (who: keyof typeof people) => ({ id: people[who].id, ip: null });
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const rooms = new Map((await store.repos.compartments.page(vessel.id, { page: 1, pageSize: 100, sort: 'designation' })).items.map((c) => [c.designation, c.id]));
  const artifactId = async (number: string) => (await store.repos.artifacts.findByNumber(vessel.id, number))!.id;
  const risks = (await store.repos.risks.page({ vesselId: vessel.id, page: 1, pageSize: 100, sort: '-magnitude' })).items;
  const at = (days: number, hour = 10) => new Date(`${daysAgo(days)}T${String(hour).padStart(2, '0')}:15:00Z`);

  const ids = new Map<string, number>();
  for (const demo of DEMO_REPAIRS) {
    const subject = rooms.has(demo.findingsOf) ? { type: 'compartment' as const, id: rooms.get(demo.findingsOf)! } : { type: 'artifact' as const, id: await artifactId(demo.findingsOf) };
    const latest = (await store.repos.conditionReports.forSubject(subject.type, subject.id)).find((r) => r.status === 'submitted')!;
    const findings = (await store.repos.conditionReports.findings(latest.id)).filter((f) => demo.findings.includes(f.description));
    let project = await projects.create(
      vessel.id,
      {
        title: demo.title,
        slug: demo.slug,
        scope: { type: 'doc', content: demo.scope.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] })) },
        lines: demo.lines.map(([description, quantityMilli, unit, unitCostCents]) => ({ description, quantityMilli, unit, unitCostCents })),
        contingencyBasisPoints: demo.contingencyBasisPoints,
        contractorNotes: demo.contractorNotes,
        permitNotes: demo.permitNotes,
        hotWork: demo.hotWork ?? false,
        asbestos: demo.asbestos ?? false,
        leadPaint: demo.leadPaint ?? false,
        findingIds: findings.map((f) => f.id),
        riskIds: risks.filter((r) => demo.risks.includes(r.statement)).map((r) => r.id),
        artifactIds: await Promise.all(demo.artifacts.map(artifactId)),
        compartmentIds: demo.compartments.map((d) => rooms.get(d)!),
      },
      people.conservator,
      actorOf('conservator'),
    );
    const dates = [at(demo.proposedDaysAgo, 9)];
    for (const step of demo.steps) {
      project = await projects.changeStatus(project.id, { status: step.to, note: step.note ?? '', version: project.version }, people[step.by], actorOf(step.by));
      dates.push(at(step.daysAgo, 11));
    }
    await store.repos.repairProjects.backdate(project.id, dates);
    ids.set(demo.slug, project.id);
  }

  // The completed project: its treatment with photos before and after, and the survey after the work.
  const projectId = ids.get(DEMO_TREATMENT.project)!;
  const project = await projects.get(projectId, people.conservator);
  const treatment = await treatments.create(
    projectId,
    { performedOn: daysAgo(DEMO_TREATMENT.daysAgo), performedById: people.conservator.id, contractorName: '', method: DEMO_TREATMENT.method, materials: DEMO_TREATMENT.materials, findingIds: project.findings.map((f) => f.id) },
    people.conservator,
    actorOf('conservator'),
  );
  for (const stage of ['before', 'after'] as const) {
    const jpeg = await gaugePhoto(stage, at(DEMO_TREATMENT.daysAgo, stage === 'before' ? 9 : 15));
    const file = path.join(files.incoming, `demo-treatment-${treatment.id}-${stage}.jpg`);
    await writeFile(file, jpeg);
    const uploaded = await media.upload({ ownerType: `treatment-${stage}`, ownerId: treatment.id }, { path: file, originalname: `gauge-board-${stage}.jpg`, size: jpeg.length }, people.conservator, actorOf('conservator'));
    const row = (await store.repos.media.findById(uploaded.id))!;
    Object.assign(row, {
      caption: stage === 'before' ? 'Gauge board with the two cracked glasses, before the work' : 'Gauge board with its new glasses',
      credit: 'Demo drawing',
      rights: 'Demo content, no rights reserved',
      altText: `Drawing standing in for a photograph of the engine-room gauge board ${stage === 'before' ? 'with two cracked glasses' : 'after its glasses were renewed'}`,
      publicUse: true,
    });
    await store.repos.media.save(row);
  }
  const gauge = await artifactId(DEMO_TREATMENT.followUp.artifact);
  const followUp = await reports.create({ subjectType: 'artifact', subjectId: gauge, inspectedOn: daysAgo(DEMO_TREATMENT.followUp.daysAgo), method: 'close-visual', temperatureC: null, relativeHumidity: null, summary: DEMO_TREATMENT.followUp.summary }, people.conservator, actorOf('conservator'));
  await reports.submit(followUp.id, followUp.version, people.conservator, actorOf('conservator'));
}
