import {readFile} from 'node:fs/promises';
import {request} from 'node:http';
import path from 'node:path';
import {afterEach, describe, expect, it} from 'vitest';
import {serveOut, type OutServer} from '../../src/serve/serve-out.js';
import {workspace} from '../helpers/workspace.js';

const page = '<!doctype html><html><head><title>r</title></head><body><p data-stet-block="a">t</p></body></html>\n';

const servers: OutServer[] = [];
afterEach(async () => {
  await Promise.all(servers.splice(0).map((server) => server.close()));
});

async function start() {
  const root = await workspace({'out/report.html': page, 'out/charts/a.svg': '<svg/>', 'secret.txt': 'do not serve'});
  const server = await serveOut(path.join(root, 'out'), 'report.html', 0);
  servers.push(server);
  return {root, server};
}

/** GET with the raw path (fetch would normalise `..` away). */
function get(server: OutServer, rawPath: string): Promise<{status: number; type: string; body: string}> {
  return new Promise((resolve, reject) => {
    request({host: '127.0.0.1', port: server.port, path: rawPath}, (response) => {
      let body = '';
      response.setEncoding('utf8').on('data', (chunk: string) => (body += chunk)).on('end', () =>
        resolve({status: response.statusCode ?? 0, type: String(response.headers['content-type']), body}));
    }).on('error', reject).end();
  });
}

describe('serving the output folder', () => {
  it('listens on 127.0.0.1 on a free port when asked for port 0', async () => {
    const {server} = await start();
    expect(server.port).toBeGreaterThan(0);
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
  });

  it('serves the report at / with the live-reload script, leaving the built file untouched', async () => {
    const {root, server} = await start();
    const served = await get(server, '/');
    expect(served.status).toBe(200);
    expect(served.type).toMatch(/^text\/html/);
    expect(served.body).toContain('/__stet/events');
    expect(served.body.indexOf('data-stet-live-reload')).toBeLessThan(served.body.indexOf('</body>'));
    expect(await readFile(path.join(root, 'out/report.html'), 'utf8')).toBe(page);
  });

  it('serves a page that waits for the first good build when there is no output yet', async () => {
    const root = await workspace({'report.md': ''});
    const server = await serveOut(path.join(root, 'out'), 'report.html', 0);
    servers.push(server);
    const served = await get(server, '/');
    expect(served.status).toBe(200);
    expect(served.body).toContain('No output yet');
    expect(served.body).toContain('/__stet/events');
    expect((await get(server, '/report.html')).status).toBe(404);
  });

  it('serves charts with their type, and nothing outside the folder', async () => {
    const {server} = await start();
    expect(await get(server, '/charts/a.svg')).toMatchObject({status: 200, type: 'image/svg+xml', body: '<svg/>'});
    for (const attempt of ['/../secret.txt', '/..%2fsecret.txt', '/%2e%2e/secret.txt', '/charts/../../secret.txt', '/nope.html']) {
      const response = await get(server, attempt);
      expect(response.status, attempt).toBe(404);
      expect(response.body, attempt).not.toContain('do not serve');
    }
  });

  it('sends the state on connecting, then rebuilds and failures as events', async () => {
    const {server} = await start();
    const received: string[] = [];
    const done = new Promise<void>((resolve, reject) => {
      request({host: '127.0.0.1', port: server.port, path: '/__stet/events'}, (response) => {
        expect(response.headers['content-type']).toBe('text/event-stream');
        response.setEncoding('utf8').on('data', (chunk: string) => {
          received.push(chunk);
          if (received.length === 1) server.rebuilt(['a', 'b']);
          if (received.length === 2) server.failed('report.md:3:1: error: <b>bad</b>');
          if (received.length === 3) resolve();
        });
      }).on('error', reject).end();
    });
    await done;
    expect(received).toEqual([
      'event: ok\ndata: null\n\n',
      'event: rebuilt\ndata: ["a","b"]\n\n',
      'event: failed\ndata: "report.md:3:1: error: <b>bad</b>"\n\n',
    ]);
  });
});
