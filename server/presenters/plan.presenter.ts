import { PLAN_TILE_SIZE, type Plan } from '../../shared/schemas/plans.js';
import type { PlanEntity } from '../db/entities/plan.entity.js';

export function planVersion(plan: PlanEntity): string {
  return `${plan.id}-${plan.contentHash.slice(0, 12)}`;
}

export function presentPlan(plan: PlanEntity, current: PlanEntity | null): Plan {
  const hasTiles = plan.status === 'ready' || plan.status === 'awaiting-choice';
  const aspect = (p: PlanEntity) => p.width / p.height;
  return {
    id: plan.id,
    deckId: plan.deckId,
    status: plan.status,
    originalName: plan.originalName,
    width: plan.width,
    height: plan.height,
    maxZoom: plan.maxZoom,
    tileSize: PLAN_TILE_SIZE,
    tilesTotal: plan.tilesTotal,
    tilesDone: plan.tilesDone,
    tileUrl: hasTiles ? `/api/v1/decks/${plan.deckId}/tiles/${planVersion(plan)}/{z}/{y}/{x}.png` : null,
    error: plan.error,
    createdAt: plan.createdAt.toISOString(),
    finishedAt: plan.finishedAt?.toISOString() ?? null,
    aspectChange: plan.status === 'awaiting-choice' && current ? { from: aspect(current), to: aspect(plan) } : null,
  };
}
