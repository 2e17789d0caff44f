import type { OutboxPage, OutboxQuery } from '../../shared/schemas/outbox.js';
import type { FakeMailServer } from '../fakes/mail-server.js';
import { NotFoundError } from '../http/errors.js';

/** Reads the messages the local fake mail server kept; empty when real SMTP is configured. */
export class OutboxService {
  constructor(private readonly fakeMail: FakeMailServer | null) {}

  list(query: OutboxQuery): OutboxPage {
    const all = this.fakeMail?.list() ?? [];
    const to = query.to?.toLowerCase();
    const filtered = to ? all.filter((m) => m.to.some((address) => address.toLowerCase().includes(to))) : [...all];
    if (query.sort === 'receivedAt') filtered.reverse();
    const start = (query.page - 1) * query.pageSize;
    const items = filtered.slice(start, start + query.pageSize).map(({ id, from, to, subject, receivedAt }) => ({ id, from, to, subject, receivedAt }));
    return { items, total: filtered.length, page: query.page, pageSize: query.pageSize, available: this.fakeMail !== null };
  }

  get(id: string) {
    const message = this.fakeMail?.get(id);
    if (!message) throw new NotFoundError('The message');
    return message;
  }
}
