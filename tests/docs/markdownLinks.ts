// Reading the links and headings of a Markdown file, for tests/docs/docLinks.test.ts.
// Only what the project's documents use: inline links and images, reference
// definitions, ATX and setext headings, and explicit <a id="…"> anchors. Code
// (fenced blocks and inline spans) is blanked out first, so that a link shown
// as code is not checked.
import { existsSync, statSync } from 'node:fs';
import { dirname, extname, resolve } from 'node:path';

/** A link found in a document, with the line it is on (1-based). */
export interface MarkdownLink {
  target: string;
  line: number;
}

/** A link that does not resolve, with the reason. */
export interface BrokenLink extends MarkdownLink {
  file: string;
  reason: string;
}

/** The text with fenced code blocks and inline code spans replaced by spaces (line breaks kept). */
export function blankCode(text: string): string {
  const lines = text.split('\n');
  let fence: string | undefined;
  const out = lines.map((line) => {
    const opener = /^\s{0,3}(`{3,}|~{3,})/.exec(line);
    if (fence) {
      if (opener && opener[1]![0] === fence[0] && opener[1]!.length >= fence.length && line.trim() === opener[1]) fence = undefined;
      return '';
    }
    if (opener) {
      fence = opener[1]!;
      return '';
    }
    return line;
  });
  // Inline code: a run of n backticks up to the next run of exactly n.
  return out.join('\n').replace(/(`+)([\s\S]*?[^`])\1(?!`)/g, (m) => m.replace(/[^\n]/g, ' '));
}

/** The GitHub anchor of a heading's text: inline markup removed, lower case, punctuation dropped, spaces to hyphens. */
export function headingSlug(heading: string): string {
  const text = heading
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1') // links and images keep their text
    .replace(/<[^>]+>/g, '') // inline HTML
    .replace(/[*`]/g, '')
    .trim()
    .toLowerCase();
  return text.replace(/[^\p{L}\p{M}\p{N}\p{Pc} -]/gu, '').replace(/ /g, '-');
}

/** Every anchor a document defines: its headings' slugs (repeats numbered -1, -2, … as GitHub does) and explicit ids. */
export function anchorsOf(markdown: string): Set<string> {
  const text = blankCode(markdown);
  const lines = text.split('\n');
  const seen = new Map<string, number>();
  const anchors = new Set<string>();
  const add = (heading: string) => {
    const base = headingSlug(heading);
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    anchors.add(n === 0 ? base : `${base}-${n}`);
  };
  lines.forEach((line, i) => {
    const atx = /^\s{0,3}#{1,6}\s+(.*?)(?:\s+#+\s*)?$/.exec(line);
    if (atx) add(atx[1]!);
    else if (i > 0 && /^\s{0,3}(=+|-+)\s*$/.test(line) && lines[i - 1]!.trim() !== '' && !/^\s{0,3}([-*_]\s*){3,}$/.test(lines[i - 1]!) && !/^\s{0,3}#/.test(lines[i - 1]!)) {
      // A setext underline; a line of dashes under a table row or list is not one, but the project's documents have neither there.
      if (/=/.test(line) || !/^\s*[-*+|]/.test(lines[i - 1]!)) add(lines[i - 1]!);
    }
    for (const m of line.matchAll(/<a\s+(?:id|name)="([^"]+)"/g)) anchors.add(m[1]!);
  });
  return anchors;
}

/** Every link target of a document: inline links and images, and reference definitions. */
export function linksOf(markdown: string): MarkdownLink[] {
  const lines = blankCode(markdown).split('\n');
  const out: MarkdownLink[] = [];
  lines.forEach((line, i) => {
    for (const m of line.matchAll(/\]\(\s*(<[^>]*>|[^\s()]*(?:\([^\s()]*\)[^\s()]*)*)(?:\s+(?:"[^"]*"|'[^']*'))?\s*\)/g)) {
      out.push({ target: m[1]!.replace(/^<|>$/g, ''), line: i + 1 });
    }
    const def = /^\s{0,3}\[[^\]]+\]:\s*(\S+)/.exec(line);
    if (def) out.push({ target: def[1]!.replace(/^<|>$/g, ''), line: i + 1 });
  });
  return out;
}

/**
 * The links of one document that do not resolve: a relative path that names
 * no file or folder, or an #anchor that no heading of the target defines.
 * Web and mail links are not fetched.
 *
 * @param file - absolute path of the document
 * @param markdown - its text
 * @param read - reads another Markdown file (for its anchors)
 */
export function brokenLinks(file: string, markdown: string, read: (path: string) => string): BrokenLink[] {
  const broken: BrokenLink[] = [];
  const anchorCache = new Map<string, Set<string>>();
  const anchorsIn = (path: string) => {
    let a = anchorCache.get(path);
    if (!a) anchorCache.set(path, (a = anchorsOf(path === file ? markdown : read(path))));
    return a;
  };
  for (const link of linksOf(markdown)) {
    const { target } = link;
    if (/^[a-z][a-z0-9+.-]*:/i.test(target)) continue; // https:, mailto:
    const hash = target.indexOf('#');
    const pathPart = decodeURIComponent(hash >= 0 ? target.slice(0, hash) : target);
    const anchor = hash >= 0 ? decodeURIComponent(target.slice(hash + 1)) : undefined;
    if (pathPart === '' && anchor === undefined) {
      broken.push({ ...link, file, reason: 'empty link' });
      continue;
    }
    const path = pathPart === '' ? file : resolve(dirname(file), pathPart);
    if (pathPart !== '' && !existsSync(path)) {
      broken.push({ ...link, file, reason: `no file ${pathPart}` });
      continue;
    }
    if (anchor === undefined) continue;
    if (pathPart !== '' && (statSync(path).isDirectory() || extname(path).toLowerCase() !== '.md')) {
      broken.push({ ...link, file, reason: `#${anchor} points into ${pathPart}, which is not a Markdown file` });
      continue;
    }
    if (!anchorsIn(path).has(anchor)) broken.push({ ...link, file, reason: `no heading with the anchor #${anchor} in ${pathPart === '' ? 'this file' : pathPart}` });
  }
  return broken;
}
