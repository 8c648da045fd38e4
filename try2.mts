import { chromium } from 'playwright-core';
import { startWorkbenchServer } from './src/node/workbenchServer.ts';
const server = await startWorkbenchServer({ directory: '/work/wt/warm/dist/workbench' });
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
for (let i = 0; i < 3; i++) {
const page = await browser.newPage();
const t0 = Date.now();
await page.goto(server.url, { waitUntil: 'domcontentloaded' });
const t1 = Date.now();
await page.waitForSelector('body[data-ready="true"]');
console.log('dom', t1 - t0, 'ready', Date.now() - t0, await page.evaluate(() => JSON.stringify(performance.getEntriesByType('resource').map((e) => [e.name.split('/').pop(), Math.round(e.startTime), Math.round(e.responseEnd)]))));
await page.close();
}
await browser.close(); await server.close();
