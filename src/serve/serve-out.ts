import {createServer, type ServerResponse} from 'node:http';
import type {AddressInfo} from 'node:net';
import {readFile, stat} from 'node:fs/promises';
import path from 'node:path';
import {withLiveReload} from './live-reload-script.js';
import {resolveInside} from './safe-path.js';

/** Our own default port for `stet watch --serve`. */
export const defaultPort = 4817;

const types: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.csv': 'text/csv; charset=utf-8',
  '.md': 'text/markdown; charset=utf-8',
  '.tex': 'text/plain; charset=utf-8',
};

const waitingPage = '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>stet</title></head>' +
  '<body><p>No output yet: stet shows the report here after its first good build.</p></body></html>\n';

export interface OutServer {
  readonly url: string;
  readonly port: number;
  /** Tell open pages the output was rebuilt (with the blocks whose values changed). */
  rebuilt(changedBlocks: readonly string[]): void;
  /** Tell open pages the last rebuild failed; pages keep showing the previous output. */
  failed(text: string): void;
  close(): Promise<void>;
}

/**
 * Serve `outDir` on 127.0.0.1 only, with live reload over Server-Sent
 * Events at /__stet/events. HTML gets the reload script as it is served;
 * the file on disk is never changed. `/` opens `index` (the report's page).
 */
export async function serveOut(outDir: string, index: string, port: number = defaultPort): Promise<OutServer> {
  const clients = new Set<ServerResponse>();
  let failure: string | undefined;

  const send = (response: ServerResponse, event: string, data: unknown) =>
    response.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);

  const server = createServer((request, response) => {
    void (async () => {
      const url = request.url ?? '/';
      if (request.method !== 'GET' && request.method !== 'HEAD') return end(response, 405, 'method not allowed');
      if (url === '/__stet/events') {
        response.writeHead(200, {'content-type': 'text/event-stream', 'cache-control': 'no-store', connection: 'keep-alive'});
        clients.add(response);
        request.on('close', () => clients.delete(response));
        if (failure === undefined) send(response, 'ok', null);
        else send(response, 'failed', failure);
        return;
      }
      const file = resolveInside(outDir, url === '/' ? index : url);
      const exists = file !== undefined && (await stat(file).then((s) => s.isFile(), () => false));
      if (!exists && url === '/') {
        // No good build yet: a page that waits for the first one.
        response.writeHead(200, {'content-type': types['.html']!, 'cache-control': 'no-store'});
        return void response.end(withLiveReload(waitingPage));
      }
      if (!file || !exists) return end(response, 404, 'not found');
      const body = await readFile(file);
      const type = types[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
      const content = type.startsWith('text/html') ? withLiveReload(body.toString('utf8')) : body;
      response.writeHead(200, {'content-type': type, 'cache-control': 'no-store'});
      response.end(request.method === 'HEAD' ? undefined : content);
    })().catch(() => end(response, 500, 'could not read the file'));
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const actual = (server.address() as AddressInfo).port;
  return {
    url: `http://127.0.0.1:${actual}/`,
    port: actual,
    rebuilt(changedBlocks) {
      failure = undefined;
      for (const client of clients) send(client, 'rebuilt', changedBlocks);
    },
    failed(text) {
      failure = text;
      for (const client of clients) send(client, 'failed', text);
    },
    async close() {
      for (const client of clients) client.end();
      clients.clear();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

function end(response: ServerResponse, status: number, text: string): void {
  if (response.headersSent) return void response.end();
  response.writeHead(status, {'content-type': 'text/plain; charset=utf-8'});
  response.end(`${text}\n`);
}
