// Every relative link and #anchor in README.md, DEVELOPERS.md and the
// Markdown under docs/ (the generated API reference in docs/api/ aside) must
// name a file that exists and, for an anchor, a heading of that file. The
// `docs/….md, "Heading"` references in the TSDoc of src/ must name a heading
// too. The tables docs/methods.md copies from the generated reports must
// still match them (rerun `npm run calibrate` / `npm run validate` and copy
// again when they change).
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { anchorsOf, brokenLinks, headingSlug, linksOf } from './markdownLinks.js';

const root = join(import.meta.dirname, '..', '..');
const read = (path: string) => readFileSync(path, 'utf8');

function markdownUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (path === join(root, 'docs', 'api')) return [];
    if (statSync(path).isDirectory()) return markdownUnder(path);
    return name.toLowerCase().endsWith('.md') ? [path] : [];
  });
}

const documents = [join(root, 'README.md'), join(root, 'DEVELOPERS.md'), ...markdownUnder(join(root, 'docs'))];

function tsFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return tsFiles(path);
    return name.endsWith('.ts') ? [path] : [];
  });
}

describe('the link checker', () => {
  it('makes GitHub anchors of headings', () => {
    expect(headingSlug('Lattice enthalpy')).toBe('lattice-enthalpy');
    expect(headingSlug('Born–Landé')).toBe('bornlandé');
    expect(headingSlug('Volume-based thermodynamics (VBT)')).toBe('volume-based-thermodynamics-vbt');
    expect(headingSlug('The `dissolve` result: P(ΔH > 0)')).toBe('the-dissolve-result-pδh--0');
    expect([...anchorsOf('# A\n\n## Notes\n\n## Notes\n')]).toEqual(['a', 'notes', 'notes-1']);
  });

  it('ignores links shown as code and reads reference definitions', () => {
    const md = 'See [x](a.md) and `[y](b.md)`.\n\n```md\n[z](c.md)\n```\n\n[ref]: d.md#top\n';
    expect(linksOf(md).map((l) => l.target)).toEqual(['a.md', 'd.md#top']);
  });

  it('reports a missing file, a missing anchor and an anchor into a file that is not Markdown', () => {
    const file = join(root, 'docs', 'probe.md');
    const md = '# Probe\n\n[ok](#probe) [gone](#nowhere) [file](nothing-here.md) [methods](methods.md#no-such-heading) [svg](examples/cold-pack.svg#x) [web](https://example.org/#x)\n';
    const broken = brokenLinks(file, md, read);
    expect(broken.map((b) => b.target)).toEqual(['#nowhere', 'nothing-here.md', 'methods.md#no-such-heading', 'examples/cold-pack.svg#x']);
  });
});

describe('links in the documentation', () => {
  it('finds the documents', () => {
    expect(documents.map((d) => relative(root, d))).toEqual(expect.arrayContaining(['README.md', 'DEVELOPERS.md', join('docs', 'methods.md')]));
  });

  it.each(documents.map((d) => [relative(root, d), d] as const))('%s: every relative link and #anchor resolves', (_name, path) => {
    const broken = brokenLinks(path, read(path), read).map((b) => `line ${b.line}: ${b.target} — ${b.reason}`);
    expect(broken).toEqual([]);
  });

  it('README.md and DEVELOPERS.md link into docs/methods.md', () => {
    for (const name of ['README.md', 'DEVELOPERS.md']) {
      expect(linksOf(read(join(root, name))).some((l) => l.target.startsWith('docs/methods.md'))).toBe(true);
    }
  });

  it('every `docs/….md, "Heading"` reference in src/ names a heading of that file', () => {
    const missing: string[] = [];
    let seen = 0;
    for (const file of tsFiles(join(root, 'src'))) {
      const text = read(file);
      for (const m of text.matchAll(/(docs\/[\w./-]+\.md),\s*"([^"]+)"/g)) {
        seen++;
        const doc = join(root, m[1]!);
        if (!existsSync(doc)) missing.push(`${relative(root, file)}: ${m[1]} does not exist`);
        else if (!anchorsOf(read(doc)).has(headingSlug(m[2]!))) missing.push(`${relative(root, file)}: no heading "${m[2]}" in ${m[1]}`);
      }
    }
    expect(seen).toBeGreaterThan(0);
    expect(missing).toEqual([]);
  });
});

describe('tables docs/methods.md copies from the generated reports', () => {
  const methods = read(join(root, 'docs', 'methods.md'));
  const copies = [...methods.matchAll(/<!-- copied from (docs\/[\w.-]+\.md) -->\n([\s\S]*?)<!-- end of copy -->/g)];

  it('holds copies of the calibration and validation tables', () => {
    expect(copies.map((c) => c[1])).toEqual(expect.arrayContaining(['docs/lattice-calibration.md', 'docs/solution-validation.md']));
  });

  it.each(copies.map((c, i) => [`${i + 1}: ${c[1]}`, c[1]!, c[2]!] as const))('copy %s still matches the generated file line for line', (_n, source, copy) => {
    const generated = read(join(root, source));
    const rows = copy.split('\n').filter((l) => l.startsWith('|'));
    expect(rows.length).toBeGreaterThan(2);
    // The header, the rule and every row must stand in the generated file, in the same order and next to each other.
    expect(generated.includes(rows.join('\n'))).toBe(true);
  });
});
