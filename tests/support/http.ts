import type { Express } from 'express';
import request from 'supertest';
import type { Role } from '../../shared/roles.js';
import type { Store } from '../../server/db/store.js';
import { buildUser, TEST_PASSWORD } from './factories.js';

export type Agent = ReturnType<typeof request.agent>;

/** A browser-like client: keeps cookies and sends the CSRF token on changes. */
export class Client {
  readonly agent: Agent;
  csrf = '';

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  async fetchCsrf() {
    const res = await this.agent.get('/api/v1/auth/csrf').expect(200);
    this.csrf = res.body.csrfToken;
    return this.csrf;
  }

  get(path: string) {
    return this.agent.get(path);
  }

  /** A GET whose body is kept as bytes (PDFs, images). */
  getBytes(path: string) {
    return this.agent
      .get(path)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
  }

  async send(method: 'post' | 'patch' | 'put' | 'delete', path: string, body?: object) {
    if (!this.csrf) await this.fetchCsrf();
    return this.agent[method](path).set('x-csrf-token', this.csrf).send(body ?? {});
  }

  post(path: string, body?: object) {
    return this.send('post', path, body);
  }

  patch(path: string, body?: object) {
    return this.send('patch', path, body);
  }

  async signIn(email: string, password = TEST_PASSWORD) {
    const res = await this.post('/api/v1/auth/login', { email, password });
    if (res.status === 200) this.csrf = res.body.csrfToken;
    return res;
  }
}

/** A client signed in as a new user of the role. */
export async function signedInAs(app: Express, store: Store, role: Role) {
  const user = await buildUser(store, { role });
  const client = new Client(app);
  const res = await client.signIn(user.email);
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { client, user };
}

/** The `token` in a link of the form `.../path#token` inside a message body. */
export function tokenFromMail(text: string, path: string): string {
  const match = text.match(new RegExp(`${path}#([A-Za-z0-9_-]+)`));
  if (!match?.[1]) throw new Error(`no ${path} link in: ${text}`);
  return match[1];
}

/** Waits until the fake mail server holds a message for the address. */
export async function waitForMail(fakeMail: { list(): readonly { to: string[]; text: string; subject: string }[] }, to: string, timeoutMs = 5000) {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const found = fakeMail.list().find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`no mail to ${to}`);
}
