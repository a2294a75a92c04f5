import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../server/app.ts';

export type TestApp = { app: Express; close: () => Promise<void> };

/** A fresh instance of the real app, as a new server process would build it. */
export function startApp(): TestApp {
  return createApp();
}

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/**
 * A browser-like client: keeps cookies, sends the session's CSRF token on
 * every state-changing request, and takes the new token after sign-in.
 */
export class Browser {
  readonly agent: ReturnType<typeof request.agent>;
  csrfToken = '';

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  async open(): Promise<this> {
    const res = await this.agent.get('/api/auth/me');
    this.csrfToken = res.body.csrfToken;
    return this;
  }

  async send(method: Method, url: string, body?: unknown) {
    let req = this.agent[method](url);
    if (method !== 'get') req = req.set('x-csrf-token', this.csrfToken);
    const res = body === undefined ? await req : await req.send(body as object);
    if (typeof res.body?.csrfToken === 'string') this.csrfToken = res.body.csrfToken;
    return res;
  }

  get = (url: string) => this.send('get', url);
  post = (url: string, body?: unknown) => this.send('post', url, body ?? {});
  patch = (url: string, body?: unknown) => this.send('patch', url, body ?? {});
  delete = (url: string) => this.send('delete', url);

  async signIn(email: string, password: string) {
    const res = await this.post('/api/auth/sign-in', { email, password });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
    return res;
  }
}

export async function browser(app: Express): Promise<Browser> {
  return new Browser(app).open();
}
