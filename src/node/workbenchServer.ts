/**
 * The static server of the workbench page: Node's own http server on
 * 127.0.0.1, serving only the page's few files from dist/workbench/. Every
 * computation runs in the browser; the page's content security policy
 * allows no request beyond these files.
 *
 * @module
 */
import { createServer, type Server } from 'node:http';
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { IonheatError } from '../error.js';

/** The page's files and their types: nothing else is served. */
const FILES: Record<string, string> = {
  'index.html': 'text/html; charset=utf-8',
  'page.js': 'text/javascript; charset=utf-8',
  'worker.js': 'text/javascript; charset=utf-8',
  'style.css': 'text/css; charset=utf-8',
};

/** Own files only; inline styles for the charts' SVG; downloads as blob: links. */
const POLICY = "default-src 'none'; script-src 'self'; worker-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; connect-src 'self'; form-action 'none'; base-uri 'none'; frame-ancestors 'none'";

/** Where the built page lies: next to the bundle that runs this (dist/), or dist/ of a clone. */
export function workbenchDirectory(): string {
  const here = typeof __dirname === 'string' ? __dirname : dirname(fileURLToPath(import.meta.url));
  const candidates = [join(here, 'workbench'), join(here, '..', 'workbench'), join(here, '..', '..', 'dist', 'workbench'), join(here, '..', '..', '..', 'dist', 'workbench')];
  const found = candidates.find((d) => existsSync(join(d, 'index.html')) && existsSync(join(d, 'worker.js')));
  if (!found) throw new IonheatError('INVALID_ARGUMENT', 'the workbench page is not built: run npm run build in a clone (the published package ships it in dist/workbench)', {});
  return found;
}

/** A running workbench server. */
export interface WorkbenchServer {
  /** `http://127.0.0.1:<port>/`. */
  url: string;
  port: number;
  close(): Promise<void>;
}

/**
 * Serves the page from `directory` on 127.0.0.1.
 *
 * @param options.port - the port, 0 (default) for a free one
 * @param options.directory - the built page (default {@link workbenchDirectory})
 */
export async function startWorkbenchServer(options: { port?: number; directory?: string } = {}): Promise<WorkbenchServer> {
  const directory = options.directory ?? workbenchDirectory();
  // Read once: the page is a handful of files and the server never writes.
  const bodies = new Map(Object.keys(FILES).map((name) => [name, readFileSync(join(directory, name))]));
  const server: Server = createServer((request, response) => {
    const path = (request.url ?? '/').split('?')[0]!;
    const name = path === '/' ? 'index.html' : path.slice(1);
    const body = bodies.get(name);
    const headers = { 'content-security-policy': POLICY, 'x-content-type-options': 'nosniff', 'cache-control': 'no-cache', 'referrer-policy': 'no-referrer' };
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      response.writeHead(405, { ...headers, allow: 'GET, HEAD', 'content-type': 'text/plain; charset=utf-8' }).end('only GET\n');
      return;
    }
    if (!body) {
      response.writeHead(404, { ...headers, 'content-type': 'text/plain; charset=utf-8' }).end('not found\n');
      return;
    }
    response.writeHead(200, { ...headers, 'content-type': FILES[name]!, 'content-length': body.length });
    response.end(request.method === 'HEAD' ? undefined : body);
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', (e: NodeJS.ErrnoException) => reject(new IonheatError('INVALID_ARGUMENT', `cannot serve the workbench on 127.0.0.1:${options.port ?? 0}: ${e.code ?? e.message}`, { field: 'port' })));
    server.listen(options.port ?? 0, '127.0.0.1', resolve);
  });
  const port = (server.address() as { port: number }).port;
  return {
    url: `http://127.0.0.1:${port}/`,
    port,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
