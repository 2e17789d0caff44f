import type { DataSource } from 'typeorm';
import { AUDIENCES, type Audience, type SaveInterpretationBody } from '../../../shared/schemas/interpretation.js';
import type { RichTextDoc } from '../../../shared/schemas/rich-text.js';
import type { Config } from '../../config.js';
import type { Mailer } from '../../mail/mailer.js';
import { InterpretationService } from '../../services/interpretation.service.js';
import { Store } from '../store.js';
import { DEMO_INTERPRETATIONS, type DemoInterpretation } from './demo-interpretation.js';

/** The demo sends no mail: nobody needs to review invented text. */
const quiet = { send: async () => undefined } as unknown as Mailer;

const doc = (paragraphs: string[] | undefined, ladder = false): RichTextDoc | null => {
  if (!paragraphs?.length && !ladder) return null;
  const content: NonNullable<RichTextDoc['content']> = (paragraphs ?? []).map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] }));
  if (ladder) {
    // The evaporator: heating steam in the coils a little above the atmosphere, sea water in the shell under a vacuum.
    const config = { title: 'Why the sea water boils', unit: 'F', stages: [{ name: 'Heating steam', pressure: 5, reading: 'psig' }, { name: 'Sea water in the shell', pressure: 10, reading: 'inHgVac' }] };
    content.push({ type: 'explainer', attrs: { kind: 'boiling-ladder', config: JSON.stringify(config) } });
  }
  return { type: 'doc', content };
};

function bodyOf(texts: DemoInterpretation['texts'], version: number): SaveInterpretationBody {
  const body: SaveInterpretationBody = { version };
  for (const audience of AUDIENCES) {
    const t = texts[audience as Audience] as { label?: string[]; story?: string[]; ladder?: boolean } | undefined;
    if (t) body[audience] = { label: doc(t.label), story: doc(t.story, t.ladder) };
  }
  return body;
}

/** Interpretive text on a dozen demo artifacts and the engine room: most published, one in review, one returned, one a draft. */
export async function seedDemoInterpretation(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const service = new InterpretationService(store, quiet, config);
  const person = async (email: string) => {
    const user = (await store.repos.users.findByEmail(email))!;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  };
  const docent = await person('docent@shipkeeper.test');
  const curator = await person('curator@shipkeeper.test');
  const asDocent = { id: docent.id, ip: null };
  const asCurator = { id: curator.id, ip: null };
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const rooms = new Map((await store.repos.compartments.page(vessel.id, { page: 1, pageSize: 100, sort: 'designation' })).items.map((c) => [c.designation, c.id]));

  for (const demo of DEMO_INTERPRETATIONS) {
    const room = rooms.get(demo.subject);
    const artifact = room ? null : await store.repos.artifacts.findByNumber(vessel.id, demo.subject);
    if (!room && !artifact) continue;
    const type = room ? ('compartment' as const) : ('artifact' as const);
    const id = room ?? artifact!.id;
    const body = bodyOf(demo.texts, 0);
    const photo = demo.photo && artifact ? await store.repos.media.firstPhoto('artifact', artifact.id) : null;
    const story = body.general?.story;
    if (photo?.publicUse && photo.altText.trim() && story) {
      story.content = [{ type: 'image', attrs: { src: `/api/v1/media/${photo.id}/display`, alt: photo.altText } }, ...(story.content ?? [])];
    }
    let record = await service.save(type, id, body, docent, asDocent);
    if (demo.outcome === 'draft') continue;
    record = await service.submit(type, id, record.version, docent, asDocent);
    if (demo.outcome === 'in-review') continue;
    if (demo.outcome === 'returned') {
      await service.returnToAuthor(type, id, { version: record.version, comment: demo.returnComment ?? 'Please look at this again.' }, curator, asCurator);
      continue;
    }
    record = await service.approve(type, id, record.version, curator, asCurator);
    if (demo.outcome === 'published-then-redrafted' && demo.redraft) await service.save(type, id, bodyOf(demo.redraft, record.version), docent, asDocent);
  }
}
