// `ionheat workbench` serves the built page on 127.0.0.1 (a free port), prints its address, serves only the page's
// own files with a policy that forbids any other request, and stops on Ctrl-C. Needs dist/ (npm test builds it).
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from '../runCliInMemory.js';

const root = join(import.meta.dirname, '..', '..', '..');
const cli = join(root, 'dist', 'cli.js');
const built = existsSync(cli) && existsSync(join(root, 'dist', 'workbench', 'index.html'));

describe('ionheat workbench', () => {
  it.skipIf(!built)('serves the page on 127.0.0.1, only its own files, until Ctrl-C', async () => {
    const child = spawn(process.execPath, [cli, 'workbench'], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stderr.on('data', (b: Buffer) => (err += b.toString()));
    const url = await new Promise<string>((resolve, reject) => {
      child.stdout.on('data', (b: Buffer) => {
        out += b.toString();
        const m = /http:\/\/127\.0\.0\.1:(\d+)\//.exec(out);
        if (m) resolve(m[0]);
      });
      child.on('exit', () => reject(new Error(`ended early: ${out}${err}`)));
    });
    try {
      expect(out).toMatch(/^ionheat workbench: http:\/\/127\.0\.0\.1:\d+\/ {2}\(open it in a browser; Ctrl-C stops\)\n$/);
      const page = await fetch(url);
      expect(page.status).toBe(200);
      expect(page.headers.get('content-type')).toBe('text/html; charset=utf-8');
      expect(page.headers.get('content-security-policy')).toMatch(/default-src 'none'.*connect-src 'self'/);
      const html = await page.text();
      expect(html).toContain('<title>ionheat workbench</title>');
      for (const file of ['page.js', 'worker.js', 'style.css']) expect((await fetch(url + file)).status).toBe(200);
      // Nothing else: not the package, not a path out of the folder, not a method that writes.
      for (const path of ['package.json', '../package.json', '%2e%2e/package.json', 'index.js', 'workbench/index.html']) expect((await fetch(url + path)).status).toBe(404);
      expect((await fetch(url, { method: 'POST', body: 'x' })).status).toBe(405);
    } finally {
      child.kill('SIGINT');
    }
    const status = await new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    expect(status).toBe(0);
    expect(err).toContain('ionheat workbench: stopped');
  });

  it('refuses a port that is not one', async () => {
    const r = await runCliInMemory(['workbench', '--port', '70000']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^ionheat: --port must be a whole number from 0 to 65535, got 70000\n$/);
  });

  it.skipIf(!built)('embedded with its own streams (no signals to stop it), serves and stops at once', async () => {
    const r = await runCliInMemory(['workbench']);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/^ionheat workbench: http:\/\/127\.0\.0\.1:\d+\//);
  });
});
