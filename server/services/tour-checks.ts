import type { PublishCheck } from '../../shared/schemas/tours.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import { UnprocessableError } from '../http/errors.js';
import type { TourContext } from './tour-context.js';

interface DocNode {
  type: string;
  attrs?: Record<string, unknown>;
  content?: DocNode[];
}

function images(node: DocNode, out: DocNode[] = []): DocNode[] {
  if (node.type === 'image') out.push(node);
  for (const child of node.content ?? []) images(child, out);
  return out;
}

function hasExplainer(node: DocNode): boolean {
  return node.type === 'explainer' || (node.content ?? []).some(hasExplainer);
}

/**
 * What stops a tour from being published, all at once, and what is said before it is: an image
 * without alt text, audio without a transcript (WCAG 2.2, success criterion 1.2.1: prerecorded
 * audio-only needs an alternative), an empty stop, an on-board stop in a space visitors may not
 * enter; and, as a warning, an on-board stop in a space closed now by an incident.
 */
export function publishCheck(tour: TourEntity, stops: TourStopEntity[], ctx: TourContext, slugTaken: boolean): PublishCheck {
  const problems: PublishCheck['problems'] = [];
  const warnings: PublishCheck['warnings'] = [];
  if (stops.length === 0) problems.push({ stop: null, field: 'stops', message: 'The tour has no stops.' });
  if (slugTaken) problems.push({ stop: null, field: 'slug', message: `Another published tour already uses the address “${tour.slug}”; choose another slug.` });
  if (tour.coverMediaId) {
    const cover = ctx.media.get(tour.coverMediaId);
    if (!cover) problems.push({ stop: null, field: 'coverMediaId', message: 'The cover image no longer exists; choose another.' });
    else if (!cover.altText.trim()) problems.push({ stop: null, field: 'coverMediaId', message: 'The cover image has no alt text; describe it in the collection.' });
  }
  stops.forEach((stop, i) => {
    const n = i + 1;
    const name = `Stop ${n} (“${stop.title}”)`;
    const doc = stop.textDoc as DocNode;
    const pictures = images(doc);
    if (!stop.textPlain.trim() && pictures.length === 0 && !hasExplainer(doc)) problems.push({ stop: n, field: 'textDoc', message: `${name} has no text.` });
    const withoutAlt = pictures.filter((p) => !String(p.attrs?.alt ?? '').trim()).length;
    if (withoutAlt) problems.push({ stop: n, field: 'textDoc', message: `${name}: ${withoutAlt === 1 ? 'an image has' : `${withoutAlt} images have`} no alt text.` });
    if (stop.audioMediaId && !stop.transcript.trim()) problems.push({ stop: n, field: 'transcript', message: `${name}: the audio has no transcript (WCAG 2.2, success criterion 1.2.1).` });
    const c = ctx.compartments.get(stop.compartmentId);
    const onBoard = !stop.virtual && tour.mode !== 'virtual';
    if (!c || !onBoard) return;
    const space = `${c.designation} ${c.name}`;
    if (ctx.closedNow.has(c.id)) {
      warnings.push({ stop: n, message: `${name} is in ${space}, closed to visitors now (since ${ctx.closureSince.get(c.id)}): the public tour shows it as a virtual stop until the space reopens.` });
    } else if (c.accessStatus === 'sealed' || c.accessStatus === 'staff-only') {
      problems.push({ stop: n, field: 'virtual', message: `${name} is on board in ${space}, which is ${c.accessStatus === 'sealed' ? 'sealed' : 'staff only'}: make it a virtual stop or choose another space.` });
    }
  });
  return { problems, warnings };
}

/** 422 listing every problem, each also under its own field. */
export function assertPublishable(check: PublishCheck, verb: 'submitted' | 'published'): void {
  if (!check.problems.length) return;
  const fields: Record<string, string> = {};
  for (const p of check.problems) {
    const key = p.stop === null ? p.field : `stops.${p.stop}.${p.field}`;
    fields[key] = fields[key] ? `${fields[key]} ${p.message}` : p.message;
  }
  const count = check.problems.length === 1 ? 'one problem' : `${check.problems.length} problems`;
  throw new UnprocessableError(`The tour cannot be ${verb} yet (${count}): ${check.problems.map((p) => p.message).join(' ')}`, fields);
}
