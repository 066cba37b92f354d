import type { Express } from 'express';
import request from 'supertest';
import { TEST_PASSWORD } from './factories';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface UploadFile {
  data: Buffer;
  name: string;
  type?: string;
  field?: string;
}

/** A browser-like client: keeps its cookie, fetches the CSRF token and sends it on unsafe requests. */
export class Client {
  private cookie: string[] = [];
  private csrf: string | undefined;
  constructor(private readonly app: Express | string) {}

  get cookies(): string[] {
    return this.cookie;
  }
  set cookies(value: string[]) {
    this.cookie = value;
    this.csrf = undefined;
  }

  private remember(res: request.Response) {
    const set = res.headers['set-cookie'] as unknown as string[] | undefined;
    if (set?.length) this.cookie = set.map((c) => c.split(';')[0]!);
  }

  async csrfToken(): Promise<string> {
    if (!this.csrf) {
      const res = await request(this.app).get('/api/csrf').set('Cookie', this.cookie);
      this.remember(res);
      this.csrf = res.body.token as string;
    }
    return this.csrf;
  }

  async send(
    method: Method,
    path: string,
    body?: unknown,
    opts: { csrf?: boolean } = {},
  ): Promise<request.Response> {
    const unsafe = method !== 'get';
    const token = unsafe && opts.csrf !== false ? await this.csrfToken() : undefined;
    let req = request(this.app)[method](path).set('Cookie', this.cookie);
    if (token) req = req.set('X-CSRF-Token', token);
    const res = body === undefined ? await req : await req.send(body as object);
    this.remember(res);
    if (res.body?.csrfToken) this.csrf = res.body.csrfToken as string;
    return res;
  }

  get = (path: string) => this.send('get', path);
  post = (path: string, body?: unknown) => this.send('post', path, body);
  patch = (path: string, body?: unknown) => this.send('patch', path, body);
  put = (path: string, body?: unknown) => this.send('put', path, body);
  delete = (path: string) => this.send('delete', path);

  /** A multipart POST, as a browser form sends files (with the CSRF header, like every unsafe request). */
  async upload(
    path: string,
    files: UploadFile[],
    fields: Record<string, string> = {},
  ): Promise<request.Response> {
    const token = await this.csrfToken(); // first: fetching it may set the session cookie
    let req = request(this.app).post(path).set('Cookie', this.cookie).set('X-CSRF-Token', token);
    for (const [name, value] of Object.entries(fields)) req = req.field(name, value);
    for (const f of files)
      req = req.attach(f.field ?? 'photos', f.data, {
        filename: f.name,
        contentType: f.type ?? 'application/octet-stream',
      });
    const res = await req;
    this.remember(res);
    return res;
  }

  async signIn(email: string, password = TEST_PASSWORD): Promise<request.Response> {
    return this.post('/api/session', { email, password });
  }
}

export async function signedIn(
  app: Express | string,
  email: string,
  password = TEST_PASSWORD,
): Promise<Client> {
  const c = new Client(app);
  const res = await c.signIn(email, password);
  if (res.status !== 200)
    throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return c;
}
