import { abcRisk, bandOf, isHalfStepScore, PRIORITY_LABELS, scoreA, scoreB, scoreC, type RiskScale } from '../../shared/calc/abc-risk.js';
import { can } from '../../shared/permissions.js';
import type { Risk, RisksQuery, UpdateRiskBody, createRiskBody } from '../../shared/schemas/risks.js';
import type { z } from 'zod';
import type { RiskSubjectEntity } from '../db/entities/risk-subject.entity.js';
import type { RiskEntity } from '../db/entities/risk.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { NotFoundError, UnprocessableError } from '../http/errors.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { staleEditError } from './stale-edit.js';

type Scores = Pick<RiskEntity, 'a' | 'b' | 'c' | 'yearsBetween' | 'lossPerItemPercent' | 'assetFractionPercent'>;
type ScoreInputs = { a: number | null; b: number | null; c: number | null; yearsBetween: number | null; lossPerItemPercent: number | null; assetFractionPercent: number | null };

/** Each score from itself or its plain input; 422 naming the field and its range when off the scale. */
export function scoresOf(input: ScoreInputs, scale: RiskScale): Scores & Pick<RiskEntity, 'magnitude' | 'band'> {
  const one = (score: number | null, plain: number | null, convert: (v: number) => number, name: 'a' | 'b' | 'c', plainName: string) => {
    if (plain !== null) {
      try {
        return { score: convert(plain), plain };
      } catch (err) {
        throw new UnprocessableError((err as Error).message, { [plainName]: (err as Error).message });
      }
    }
    if (score === null) throw new UnprocessableError(`Give ${name.toUpperCase()} (1–5 in half steps) or ${plainName}.`, { [name]: 'Missing.' });
    if (!isHalfStepScore(score)) throw new UnprocessableError(`${name.toUpperCase()} must be between 1 and 5 in steps of 0.5.`, { [name]: 'Between 1 and 5 in steps of 0.5.' });
    return { score, plain: null };
  };
  const a = one(input.a, input.yearsBetween, (v) => scoreA(v, scale), 'a', 'yearsBetween');
  const b = one(input.b, input.lossPerItemPercent, (v) => scoreB(v, scale), 'b', 'lossPerItemPercent');
  const c = one(input.c, input.assetFractionPercent, (v) => scoreC(v, scale), 'c', 'assetFractionPercent');
  const risk = abcRisk(a.score, b.score, c.score, scale);
  return { a: a.score, b: b.score, c: c.score, yearsBetween: a.plain, lossPerItemPercent: b.plain, assetFractionPercent: c.plain, magnitude: risk.magnitude, band: risk.band };
}

const FIELDS: (keyof RiskEntity)[] = ['statement', 'agent', 'status', 'a', 'b', 'c', 'yearsBetween', 'lossPerItemPercent', 'assetFractionPercent', 'notes'];

/** The risk register, scored by the ABC method; and the per-compartment overlay of a deck. */
export class RiskService {
  constructor(private readonly store: Store) {}

  private async subjectsFor(repos: Repositories, vesselId: number, artifactIds: number[], compartmentIds: number[]) {
    const subjects: Omit<RiskSubjectEntity, 'riskId' | 'risk'>[] = [];
    for (const id of new Set(compartmentIds)) {
      const c = await repos.compartments.findById(id);
      if (!c || c.vesselId !== vesselId) throw new UnprocessableError(`Compartment ${id} is not on this vessel.`, { compartmentIds: `Not a compartment of this vessel: ${id}.` });
      subjects.push({ subjectType: 'compartment', subjectId: id, deckId: c.deckId });
    }
    for (const id of new Set(artifactIds)) {
      const a = await repos.artifacts.findById(id);
      if (!a || a.vesselId !== vesselId) throw new UnprocessableError(`Artifact ${id} is not in the collection of this vessel.`, { artifactIds: `Not an artifact of this vessel: ${id}.` });
      subjects.push({ subjectType: 'artifact', subjectId: id, deckId: a.compartment?.deckId ?? null });
    }
    return subjects;
  }

  private async present(risks: RiskEntity[], viewer: Express.User): Promise<Risk[]> {
    const repos = this.store.repos;
    const subjects = await repos.risks.subjectsOf(risks.map((r) => r.id));
    const out: Risk[] = [];
    const compartmentLabels = await repos.compartments.labels(subjects.filter((s) => s.subjectType === 'compartment').map((s) => s.subjectId));
    const artifactLabels = await repos.artifacts.labels(subjects.filter((s) => s.subjectType === 'artifact').map((s) => s.subjectId));
    for (const risk of risks) {
      const mine = subjects.filter((s) => s.riskId === risk.id);
      const artifacts = mine.filter((s) => s.subjectType === 'artifact').map((s) => ({ id: s.subjectId, label: artifactLabels.get(s.subjectId) ?? `Artifact ${s.subjectId}` }));
      const compartments = mine
        .filter((s) => s.subjectType === 'compartment')
        .map((s) => ({ id: s.subjectId, label: compartmentLabels.get(s.subjectId)?.label ?? `Compartment ${s.subjectId}`, deckId: compartmentLabels.get(s.subjectId)?.deckId ?? 0 }));
      out.push({
        id: risk.id,
        vesselId: risk.vesselId,
        statement: risk.statement,
        agent: risk.agent,
        status: risk.status,
        a: risk.a,
        b: risk.b,
        c: risk.c,
        yearsBetween: risk.yearsBetween,
        lossPerItemPercent: risk.lossPerItemPercent,
        assetFractionPercent: risk.assetFractionPercent,
        magnitude: risk.magnitude,
        band: risk.band,
        bandLabel: PRIORITY_LABELS[risk.band],
        artifacts,
        compartments,
        notes: risk.notes,
        updatedAt: risk.updatedAt.toISOString(),
        version: risk.version,
        abilities: { update: can(viewer.role, 'risk', 'update'), delete: can(viewer.role, 'risk', 'delete') },
      });
    }
    return out;
  }

  async list(query: RisksQuery, viewer: Express.User) {
    const page = await this.store.repos.risks.page(query);
    return { ...page, items: await this.present(page.items, viewer) };
  }

  async get(id: number, viewer: Express.User) {
    const risk = await this.store.repos.risks.findById(id);
    if (!risk) throw new NotFoundError('The risk');
    return (await this.present([risk], viewer))[0]!;
  }

  async create(body: z.output<typeof createRiskBody>, viewer: Express.User, actor: Actor) {
    const saved = await this.store.transaction(async (repos) => {
      if (!(await repos.vessels.findById(body.vesselId))) throw new UnprocessableError('Choose a vessel.', { vesselId: 'No such vessel.' });
      const scores = scoresOf(body, (await repos.settings.get()).riskScale);
      const subjects = await this.subjectsFor(repos, body.vesselId, body.artifactIds, body.compartmentIds);
      const risk = await repos.risks.create({ vesselId: body.vesselId, statement: body.statement, agent: body.agent, status: body.status, notes: body.notes, ...scores });
      await repos.risks.setSubjects(risk.id, subjects);
      await recordAudit(repos, actor, { action: 'create', entityType: 'risk', entityId: risk.id, vesselId: body.vesselId, summary: `Risk recorded (MR ${risk.magnitude}): ${risk.statement}` });
      return risk;
    });
    return this.get(saved.id, viewer);
  }

  async update(id: number, body: UpdateRiskBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const risk = await repos.risks.findById(id);
      if (!risk) throw new NotFoundError('The risk');
      if (risk.version !== body.version) throw await staleEditError(repos, 'risk', id, 'this risk', risk.version, body.version);
      const { version: _v, artifactIds, compartmentIds, ...fields } = body;
      // A score given directly replaces the plain input it came from, and the other way round.
      const inputs: ScoreInputs = { a: risk.a, b: risk.b, c: risk.c, yearsBetween: risk.yearsBetween, lossPerItemPercent: risk.lossPerItemPercent, assetFractionPercent: risk.assetFractionPercent };
      for (const [score, plain] of [['a', 'yearsBetween'], ['b', 'lossPerItemPercent'], ['c', 'assetFractionPercent']] as const) {
        if (fields[score] !== undefined && fields[score] !== null) inputs[plain] = fields[plain] ?? null;
        if (fields[plain] !== undefined) inputs[plain] = fields[plain];
        if (fields[score] !== undefined) inputs[score] = fields[score];
      }
      const scores = scoresOf(inputs, (await repos.settings.get()).riskScale);
      const next = { ...fields, ...scores };
      let changes = changesBetween(risk, next, FIELDS);
      if (artifactIds !== undefined || compartmentIds !== undefined) {
        const current = await repos.risks.subjectsOf([id]);
        const subjects = await this.subjectsFor(
          repos,
          risk.vesselId,
          artifactIds ?? current.filter((s) => s.subjectType === 'artifact').map((s) => s.subjectId),
          compartmentIds ?? current.filter((s) => s.subjectType === 'compartment').map((s) => s.subjectId),
        );
        const from = current.map((s) => `${s.subjectType} ${s.subjectId}`).sort();
        const to = subjects.map((s) => `${s.subjectType} ${s.subjectId}`).sort();
        if (from.join() !== to.join()) {
          await repos.risks.setSubjects(id, subjects);
          changes = { ...(changes ?? {}), subjects: { from, to } };
        }
      }
      if (!changes) return;
      const before = risk.version;
      Object.assign(risk, next);
      await repos.risks.save(risk);
      // A change of what the risk concerns lives in another table: the risk's own version must move too.
      if ((await repos.risks.findById(id))!.version === before) await repos.risks.bumpVersion(id);
      await recordAudit(repos, actor, { action: 'update', entityType: 'risk', entityId: id, vesselId: risk.vesselId, summary: `Risk ${id} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.get(id, viewer);
  }

  async remove(id: number, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const risk = await repos.risks.findById(id);
      if (!risk) throw new NotFoundError('The risk');
      await repos.risks.remove(id);
      await recordAudit(repos, actor, { action: 'delete', entityType: 'risk', entityId: id, vesselId: risk.vesselId, summary: `Risk deleted: ${risk.statement}` });
    });
  }

  /** Per compartment of a deck: current condition (latest submitted report) and open risks. */
  async deckOverlay(deckId: number) {
    const repos = this.store.repos;
    const deck = await repos.decks.findById(deckId);
    if (!deck) throw new NotFoundError('The deck');
    const compartments = (await repos.compartments.page(deck.vesselId, { page: 1, pageSize: 10_000, sort: 'designation', deckId })).items;
    const current = await repos.conditionReports.currentOfCompartments(compartments.map((c) => c.id));
    const risks = await repos.risks.openRisksOnDeck(deckId);
    const { riskScale } = await repos.settings.get();
    return {
      compartments: compartments.map((c) => {
        const report = current.get(c.id);
        const risk = risks.get(c.id);
        return {
          compartmentId: c.id,
          grade: report?.grade ?? null,
          reportId: report?.id ?? null,
          inspectedOn: report?.inspectedOn ?? null,
          openRisks: risk?.count ?? 0,
          maxMagnitude: risk?.maxMagnitude ?? null,
          band: risk ? bandOf(risk.maxMagnitude, riskScale) : null,
        };
      }),
    };
  }
}

