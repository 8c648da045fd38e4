/**
 * The workbench page: five panels of forms, each sent to the worker, whose
 * answer (a PanelView) is laid out here. Plain DOM; nothing is computed on
 * this thread, so the page stays responsive during a long screen.
 *
 * @module
 */
import type { Answer, Lists, Request } from './protocol.js';
import type { Cell, PanelView, Quantity, ShownNumber } from './view.js';

const worker = new Worker(new URL('./worker.js', import.meta.url), { type: 'module' });
let nextId = 1;
const waiting = new Map<number, { resolve: (a: Answer) => void; progress?: (done: number, total?: number) => void }>();
worker.onmessage = (event: MessageEvent<Answer>) => {
  const a = event.data;
  const w = waiting.get(a.id);
  if (!w) return;
  if (a.kind === 'progress') {
    w.progress?.(a.done, a.total);
    return;
  }
  waiting.delete(a.id);
  w.resolve(a);
};

/** Sends one request to the worker; resolves to its answer. */
function ask(request: Request, progress?: (done: number, total?: number) => void): Promise<Answer> {
  const id = nextId++;
  return new Promise((resolve) => {
    waiting.set(id, { resolve, ...(progress ? { progress } : {}) });
    worker.postMessage({ id, ...request });
  });
}

// ---- small DOM helpers

type Child = Node | string | null | undefined | false;
function h<K extends keyof HTMLElementTagNameMap>(tag: K, attributes: Record<string, string | boolean | undefined> = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attributes)) {
    if (v === undefined || v === false) continue;
    if (v === true) e.setAttribute(k, '');
    else e.setAttribute(k, v);
  }
  for (const c of children) if (c !== null && c !== undefined && c !== false) e.append(c);
  return e;
}
const byId = <T extends HTMLElement>(id: string): T => document.getElementById(id) as T;

function numberSpan(n: ShownNumber): HTMLElement {
  return h('span', { class: 'num', 'data-path': n.path, ...(n.magnitude ? { 'data-magnitude': 'true' } : {}) }, n.text);
}

function quantityRow(q: Quantity): HTMLElement[] {
  const value = h('dd', { class: q.strong ? 'strong' : undefined }, numberSpan(q.value));
  if (q.u) value.append(' ± ', numberSpan(q.u));
  if (q.unit) value.append(' ', h('span', { class: 'unit' }, q.unit));
  if (q.low && q.high) value.append(h('span', { class: 'interval' }, ' (95 % interval ', numberSpan(q.low), ' to ', numberSpan(q.high), q.unit ? ` ${q.unit}` : '', ')'));
  if (q.words) value.append(h('span', { class: 'words' }, ` — ${q.words}`));
  return [h('dt', {}, q.label), value];
}

function cellNode(c: Cell): Node {
  return typeof c === 'string' ? document.createTextNode(c) : numberSpan(c);
}

/** The number a cell sorts by (its first number), or undefined for text. */
function sortNumber(text: string): number | undefined {
  const m = /^[+−-]?\d+(\.\d+)?/.exec(text.trim());
  return m ? Number(m[0].replace('−', '-')) : undefined;
}

/** Rows shown at first: an enumerated screen has over a thousand, which a button shows in full. */
const TABLE_LIMIT = 100;

function sortableTable(caption: string, header: string[], rows: Cell[][], numeric: number[]): HTMLElement {
  const body = h('tbody');
  const row = (r: Cell[]) => h('tr', {}, ...r.map((c, i) => h('td', { class: numeric.includes(i) || typeof c !== 'string' ? 'n' : undefined }, cellNode(c))));
  let limit = TABLE_LIMIT;
  let current = rows;
  const more = h('button', { type: 'button', class: 'secondary show-all' }, `Show all ${rows.length} rows`);
  const note = h('p', { class: 'help' });
  const fill = (order: Cell[][]) => {
    current = order;
    body.replaceChildren(...order.slice(0, limit).map(row));
    const hidden = order.length - Math.min(limit, order.length);
    more.hidden = hidden === 0;
    note.textContent = hidden > 0 ? `Showing the first ${limit} of ${order.length} rows.` : '';
  };
  more.addEventListener('click', () => {
    limit = Infinity;
    fill(current);
    status(`Showing all ${rows.length} rows.`);
  });
  const heads = header.map((name, i) => {
    const button = h('button', { type: 'button', class: 'sort' }, name);
    const th = h('th', { scope: 'col', 'aria-sort': 'none' }, button);
    button.addEventListener('click', () => {
      const ascending = th.getAttribute('aria-sort') !== 'ascending';
      for (const other of table.querySelectorAll('th')) other.setAttribute('aria-sort', 'none');
      th.setAttribute('aria-sort', ascending ? 'ascending' : 'descending');
      const text = (c: Cell | undefined) => (c === undefined ? '' : typeof c === 'string' ? c : c.text);
      const sorted = [...rows].sort((a, b) => {
        const x = text(a[i]);
        const y = text(b[i]);
        if (x === '' || y === '') return x === y ? 0 : x === '' ? 1 : -1; // empty cells last either way
        const nx = sortNumber(x);
        const ny = sortNumber(y);
        const order = nx !== undefined && ny !== undefined ? nx - ny : x.localeCompare(y);
        return ascending ? order : -order;
      });
      fill(sorted);
      status(`Sorted by ${name}, ${ascending ? 'ascending' : 'descending'}.`);
    });
    return th;
  });
  const table = h('table', {}, h('caption', {}, caption), h('thead', {}, h('tr', {}, ...heads)), body);
  fill(rows);
  return h('div', {}, h('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-label': caption }, table), note, more);
}

/** The words that lead a caution, as the command line writes them (cautionLine). */
const SEVERITY_WORD = { danger: 'DANGER', warning: 'Warning', notice: 'Note' } as const;

function cautionBox(cautions: PanelView['cautions']): HTMLElement | null {
  if (cautions.length === 0) return null;
  const items = cautions.map((c) => h('li', { class: `caution ${c.severity}` }, h('strong', {}, `${SEVERITY_WORD[c.severity]} — `), c.text));
  return h('aside', { class: 'cautions', 'aria-label': 'Cautions' }, h('h3', {}, 'Cautions'), h('ul', {}, ...items));
}

/** Lays out a panel's answer in its output region; cautions first, where they cannot be missed. */
function showView(out: HTMLElement, view: PanelView, extra: Node[] = []): void {
  const parts: Child[] = [cautionBox(view.cautions), h('h3', { class: 'result-heading' }, view.heading), ...view.lines.map((l) => h('p', { class: 'line' }, l))];
  if (view.quantities.length > 0) parts.push(h('dl', { class: 'quantities' }, ...view.quantities.flatMap(quantityRow)));
  parts.push(...extra);
  for (const t of view.tables) parts.push(sortableTable(t.caption, t.header, t.rows, t.numeric));
  for (const c of view.charts) {
    const figure = h('figure', { class: 'chart' }, h('figcaption', {}, c.title));
    const holder = h('div', { class: 'svg' });
    holder.innerHTML = c.svg; // SVG text from the library's renderers, which escape every text they draw
    figure.append(holder);
    parts.push(figure);
  }
  if (view.notes.length > 0) parts.push(h('details', { class: 'notes' }, h('summary', {}, `Notes (${view.notes.length})`), h('ul', {}, ...view.notes.map((n) => h('li', {}, n)))));
  out.replaceChildren(...(parts.filter(Boolean) as Node[]));
}

function showError(out: HTMLElement, a: Extract<Answer, { kind: 'error' }>): void {
  const list = a.problems.length > 1 ? h('ul', { class: 'problems' }, ...a.problems.map((p) => h('li', {}, p))) : null;
  out.replaceChildren(h('div', { class: 'error', role: 'alert' }, h('strong', {}, out.id === 'data-out' ? 'Not loaded: ' : 'Cannot compute: '), a.problems.length > 1 ? `${a.message.slice(0, a.message.indexOf('(1) ')).replace(/:\s*\d+ problems:\s*$/, '')}: ${a.problems.length} problems` : a.message, list));
}

/** Runs one panel's request, with the output region marked busy meanwhile. */
async function run(out: HTMLElement, request: Request, show: (a: Answer) => void | false | Promise<void>, progress?: (done: number, total?: number) => void): Promise<void> {
  out.setAttribute('aria-busy', 'true');
  const began = performance.now();
  const a = await ask(request, progress);
  out.setAttribute('aria-busy', 'false');
  const received = performance.now();
  // Announced once in the status line (a live region), rather than reading out a whole table of results.
  if (a.kind === 'error') {
    showError(out, a); // an alert, announced as it appears
    status('');
  } else {
    status(`${out.id === 'data-out' ? 'Data' : 'Result'} ready${a.kind === 'view' ? `: ${a.view.heading}` : ''}.`);
    const shown = show(a);
    out.dataset.layoutMs = String(Math.round(performance.now() - received));
    await shown;
  }
  out.dataset.ms = String(Math.round(performance.now() - began));
  out.dataset.done = String(Number(out.dataset.done ?? '0') + 1);
}

function status(text: string): void {
  byId('status').textContent = text;
}

const num = (id: string): number | undefined => {
  const v = (byId<HTMLInputElement>(id).value ?? '').trim().replace('−', '-');
  return v === '' ? undefined : Number(v);
};
const str = (id: string): string => byId<HTMLInputElement>(id).value;

// ---- the panels

function saltPanel(): void {
  const out = byId('salt-out');
  byId<HTMLFormElement>('salt-form').addEventListener('submit', (e) => {
    e.preventDefault();
    const molality = num('salt-molality');
    const temperatureC = num('salt-temperature');
    void run(out, { kind: 'salt', input: { formula: str('salt-formula'), ...(molality !== undefined ? { molality } : {}), ...(temperatureC !== undefined ? { temperatureC } : {}), excludeMeasured: byId<HTMLInputElement>('salt-exclude').checked } }, (a) => a.kind === 'view' && showView(out, a.view));
  });
}

function packSolidRow(formula = '', mass = ''): HTMLElement {
  const k = document.querySelectorAll('#pack-solids .solid').length + 1;
  const row = h(
    'div',
    { class: 'solid' },
    h('label', { for: `pack-salt-${k}` }, `Salt ${k}`),
    h('input', { id: `pack-salt-${k}`, class: 'salt', type: 'text', value: formula, autocomplete: 'off', spellcheck: 'false', required: true }),
    h('label', { for: `pack-mass-${k}` }, 'mass (g)'),
    h('input', { id: `pack-mass-${k}`, class: 'mass', type: 'number', min: '0.001', step: 'any', value: mass, required: true }),
  );
  if (k > 1) {
    const remove = h('button', { type: 'button', class: 'secondary', 'aria-label': `Remove salt ${k}` }, 'Remove');
    remove.addEventListener('click', () => {
      row.remove();
      byId('pack-add').focus();
    });
    row.append(remove);
  }
  return row;
}

function packPanel(): void {
  const out = byId('pack-out');
  const solids = byId('pack-solids');
  solids.append(packSolidRow('NH4NO3', '30'));
  byId('pack-add').addEventListener('click', () => {
    const row = packSolidRow();
    solids.append(row);
    row.querySelector('input')?.focus();
  });
  byId<HTMLFormElement>('pack-form').addEventListener('submit', (e) => {
    e.preventDefault();
    const list = [...solids.querySelectorAll('.solid')].map((row) => ({ formula: (row.querySelector('.salt') as HTMLInputElement).value, massG: Number((row.querySelector('.mass') as HTMLInputElement).value) }));
    const startC = num('pack-start');
    const containerJPerK = num('pack-container');
    const targetC = num('pack-target');
    const fill = { solids: list, waterG: num('pack-water') ?? NaN, ...(startC !== undefined ? { startC } : {}), ...(containerJPerK !== undefined ? { containerJPerK } : {}) };
    void run(out, { kind: 'pack', input: { fill, ...(targetC !== undefined ? { targetC } : {}) } }, (a) => a.kind === 'view' && showView(out, a.view));
  });
}

function warmerPanel(): void {
  const out = byId('warmer-out');
  byId<HTMLFormElement>('warmer-form').addEventListener('submit', (e) => {
    e.preventDefault();
    const extraWaterG = num('warmer-water');
    const startC = num('warmer-start');
    const containerJPerK = num('warmer-container');
    const fill = { salt: str('warmer-salt'), massG: num('warmer-mass') ?? NaN, ...(extraWaterG !== undefined ? { extraWaterG } : {}), ...(startC !== undefined ? { startC } : {}), ...(containerJPerK !== undefined ? { containerJPerK } : {}) };
    void run(out, { kind: 'warmer', input: fill }, (a) => a.kind === 'view' && showView(out, a.view));
  });
}

let downloadUrls: string[] = [];
function download(name: string, blob: Blob): HTMLAnchorElement {
  const url = URL.createObjectURL(blob);
  downloadUrls.push(url);
  return h('a', { href: url, download: name, class: 'download' }, `Download ${name}`);
}

function screenPanel(): void {
  const out = byId('screen-out');
  const progress = byId<HTMLProgressElement>('screen-progress');
  let uploaded: { text: string; name: string } | undefined;
  byId<HTMLInputElement>('screen-file').addEventListener('change', async (e) => {
    const file = (e.target as HTMLInputElement).files?.[0];
    if (!file) return;
    uploaded = { text: await file.text(), name: file.name };
    byId<HTMLTextAreaElement>('screen-text').value = uploaded.text;
    byId<HTMLInputElement>('screen-from-text').checked = true;
    status(`Read ${file.name} (${file.size} bytes).`);
  });
  byId<HTMLTextAreaElement>('screen-text').addEventListener('input', () => {
    uploaded = undefined;
  });
  byId<HTMLFormElement>('screen-form').addEventListener('submit', (e) => {
    e.preventDefault();
    const enumerate = byId<HTMLInputElement>('screen-enumerate').checked;
    const text = str('screen-text');
    const source = enumerate ? ({ kind: 'enumerate' } as const) : ({ kind: 'text', text: uploaded?.text ?? text, name: uploaded?.name ?? 'pasted list' } as const);
    const objective = str('screen-objective');
    const direction = str('screen-direction');
    const input = { source, ...(objective ? { objective } : {}), ...(direction ? { direction } : {}), fill: str('screen-fill'), spec: str('screen-spec') } as Extract<Request, { kind: 'screen' }>['input'];
    progress.hidden = false;
    progress.removeAttribute('value');
    void run(
      out,
      { kind: 'screen', input },
      (a) => {
        progress.hidden = true;
        if (a.kind !== 'screen') return;
        const o = a.outcome;
        out.dataset.workerMs = String(o.elapsedMs);
        for (const u of downloadUrls) URL.revokeObjectURL(u);
        downloadUrls = [];
        const downloads = h('p', { class: 'downloads' }, download('screen.csv', a.csv), ' ', download('screen.json', a.json), h('span', { class: 'words' }, ' — the same files as ionheat screen --format csv / --json'));
        return showView(out, o.view, [downloads]);
      },
      (done, total) => {
        if (total) {
          progress.max = total;
          progress.value = done;
        }
      },
    ).then(() => {
      progress.hidden = true;
    });
  });
}

function applyLists(lists: Lists): void {
  const options = byId<HTMLDataListElement>('warmer-salts');
  options.replaceChildren(...lists.warmerSalts.map((s) => h('option', { value: s })));
  byId('data-label').textContent = lists.dataLabel;
  byId('enumerate-count').textContent = String(lists.builtinSalts);
}

function dataPanel(): void {
  const out = byId('data-out');
  const load = async (text: string, name: string) => {
    await run(out, { kind: 'data', input: { text, name } }, (a) => {
      if (a.kind !== 'data' || !a.loaded) return;
      applyLists(a.lists);
      out.replaceChildren(h('p', { class: 'ok', role: 'status' }, `Loaded ${name}: ${a.loaded.records} record${a.loaded.records === 1 ? '' : 's'} in ${a.loaded.tables.join(', ')}. Every panel now uses ${a.lists.dataLabel}. The file stays in this page's memory only; reloading the page forgets it.`));
    });
  };
  byId<HTMLInputElement>('data-file').addEventListener('change', async (e) => {
    const file = (e.target as HTMLInputElement).files?.[0];
    if (file) await load(await file.text(), file.name);
  });
  byId<HTMLFormElement>('data-form').addEventListener('submit', (e) => {
    e.preventDefault();
    void load(str('data-text'), 'pasted data');
  });
  byId('data-clear').addEventListener('click', () => {
    void run(out, { kind: 'clear-data', input: null }, (a) => {
      if (a.kind !== 'data') return;
      applyLists(a.lists);
      out.replaceChildren(h('p', { class: 'ok', role: 'status' }, 'Back to the built-in tables.'));
    });
  });
}

/** Tabs: click or arrow keys; one panel shown at a time. */
function tabs(): void {
  const list = [...document.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
  const select = (tab: HTMLButtonElement, focus: boolean) => {
    for (const t of list) {
      const on = t === tab;
      t.setAttribute('aria-selected', String(on));
      t.tabIndex = on ? 0 : -1;
      byId(t.getAttribute('aria-controls')!).hidden = !on;
    }
    if (focus) tab.focus();
    history.replaceState(null, '', `#${tab.id.replace(/^tab-/, '')}`);
  };
  for (const [i, t] of list.entries()) {
    t.addEventListener('click', () => select(t, false));
    t.addEventListener('keydown', (e) => {
      const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
      if (step !== 0) select(list[(i + step + list.length) % list.length]!, true);
      else if (e.key === 'Home') select(list[0]!, true);
      else if (e.key === 'End') select(list[list.length - 1]!, true);
    });
  }
  const wanted = list.find((t) => t.id === `tab-${location.hash.slice(1)}`);
  select(wanted ?? list[0]!, false);
}

tabs();
saltPanel();
packPanel();
warmerPanel();
screenPanel();
dataPanel();
// The forms and tabs respond from here on; the tables load in the worker meanwhile (data-ready below).
document.body.dataset.interactive = String(Math.round(performance.now()));
void ask({ kind: 'lists', input: null }).then((a) => {
  if (a.kind === 'lists') applyLists(a.lists);
  document.body.dataset.ready = String(Math.round(performance.now()));
  status('Ready.');
});
