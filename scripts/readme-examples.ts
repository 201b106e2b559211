/**
 * Keeps the README's examples the real output of the current code. Each example in README.md sits
 * between two markers:
 *
 *   <!-- example: warmcast run swift --to 2100 | head 12 -->
 *   ```text
 *   (whatever the command prints, regenerated)
 *   ```
 *   <!-- /example -->
 *
 * The command runs in-process (the same `main` the binary calls) in a fresh temporary folder, with
 * COLUMNS=100 as when output is piped; an argument naming a file of the repository (a test
 * fixture) is passed as its full path and shown as written. After the command, `| head N` keeps the first N lines
 * (adding `...` when more followed), `| file NAME` shows a file the command wrote instead of what it
 * printed, `| lines A-B` keeps lines A to B of it, and `| markdown` puts the text in the README as
 * Markdown (a table that renders) instead of in a text block. The temporary folder's path is shown as `.`.
 * Between `<!-- options: run -->` and `<!-- /options -->` goes a table of the command's options,
 * read from its `--help` (flags, what each does, its default).
 * test/readme.test.ts fails when the README differs from what this script would write.
 *
 * Try: npm run readme (rewrites README.md in place)
 */
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { captureIo } from '../src/cli/cli-io.js';
import { main } from '../src/cli/main.js';

/** Terminal width the examples are rendered at (what the CLI assumes when output is piped). */
export const EXAMPLE_COLUMNS = 100;

const START = /^<!-- example: (.+?) -->$/;
const END = '<!-- /example -->';
const OPTIONS_START = /^<!-- options: ([a-z-]+) -->$/;
const OPTIONS_END = '<!-- /options -->';
/** The repository's root folder (where package.json is). */
const ROOT = dirname(readmePathFrom(dirname(fileURLToPath(import.meta.url))));

/** One example's command line and what to show of its output. */
interface ExampleSpec {
  argv: string[];
  head?: number;
  file?: string;
  lines?: [number, number];
  markdown?: boolean;
}

/**
 * Reads `warmcast run swift | head 12 | file out.md | lines 3-9` into its parts.
 * @throws Error for a marker that is not a warmcast command or has an unknown step
 */
export function parseExample(marker: string): ExampleSpec {
  const [command, ...steps] = marker.split('|').map((s) => s.trim());
  const words = command.split(/\s+/);
  if (words[0] !== 'warmcast') throw new Error(`README example must start with "warmcast": ${marker}`);
  const spec: ExampleSpec = { argv: words.slice(1) };
  for (const step of steps) {
    const [name, arg] = step.split(/\s+/);
    if (name === 'markdown') spec.markdown = true;
    else if (name === 'head') spec.head = Number(arg);
    else if (name === 'file') spec.file = arg;
    else if (name === 'lines') {
      const [a, b] = arg.split('-').map(Number);
      spec.lines = [a, b];
    } else throw new Error(`README example step must be head, file, lines or markdown: "${step}" in ${marker}`);
  }
  return spec;
}

/** Runs one example and returns the text to show (no trailing newline). */
export async function runExample(spec: ExampleSpec): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'warmcast-readme-'));
  const columns = process.env.COLUMNS;
  process.env.COLUMNS = String(EXAMPLE_COLUMNS);
  try {
    const io = captureIo(dir);
    const argv = spec.argv.map((a) => (/^(test|pathways)\//.test(a) && existsSync(join(ROOT, a)) ? join(ROOT, a) : a));
    const code = await main(argv, io);
    let text = spec.file ? readFileSync(join(dir, spec.file), 'utf8') : io.out + io.err;
    if (code !== 0 && !spec.file) text += `(exit ${code})\n`;
    text = text.split(dir).join('.').split(`${ROOT}/`).join('');
    let lines = text.replace(/\n+$/, '').split('\n').map((l) => l.trimEnd());
    if (spec.lines) lines = lines.slice(spec.lines[0] - 1, spec.lines[1]);
    if (spec.head !== undefined && lines.length > spec.head) {
      const more = lines.length - spec.head;
      lines = [...lines.slice(0, spec.head), spec.markdown ? `\n(${more} more lines)` : '...'];
    }
    return lines.join('\n');
  } finally {
    if (columns === undefined) delete process.env.COLUMNS;
    else process.env.COLUMNS = columns;
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * A Markdown table of a command's options, read from its `--help`: each option's flags, its
 * description (without the default) and its default.
 */
export async function optionsTable(command: string): Promise<string> {
  const io = captureIo();
  await main([command, '--help'], io);
  const lines = io.out.split('\n');
  const first = lines.indexOf('Options:');
  if (first < 0) throw new Error(`warmcast ${command} --help has no Options section`);
  const options: { flags: string; text: string }[] = [];
  for (const line of lines.slice(first + 1)) {
    if (line.trim() === '') break;
    const m = /^  (\S.*?)(?: {2,}(.*))?$/.exec(line);
    if (m) options.push({ flags: m[1], text: m[2] ?? '' });
    else options[options.length - 1].text += ` ${line.trim()}`;
  }
  const rows = options
    .filter((o) => !o.flags.startsWith('-h, --help'))
    .map((o) => {
      const def = /\s*\((?:choices: (.*?), )?default: (.*)\)$/.exec(o.text);
      const text = def ? o.text.slice(0, def.index) + (def[1] ? ` (${def[1]})` : '') : o.text;
      const cell = (s: string) => s.replace(/\|/g, '\\|');
      return `| \`${o.flags}\` | ${cell(text)} | ${def ? cell(def[2]) : ''} |`;
    });
  return ['| option | what it does | default |', '|---|---|---|', ...rows].join('\n');
}

/**
 * The README with every example's block replaced by the current output of its command.
 * @throws Error when a marker is not closed or its block is not a fenced code block
 */
export async function renderReadme(text: string): Promise<string> {
  const lines = text.split('\n');
  const out: string[] = [];
  for (let i = 0; i < lines.length; i++) {
    out.push(lines[i]);
    const o = OPTIONS_START.exec(lines[i]);
    if (o) {
      const end = lines.indexOf(OPTIONS_END, i + 1);
      if (end < 0) throw new Error(`README line ${i + 1}: options of "${o[1]}" have no ${OPTIONS_END}`);
      out.push(await optionsTable(o[1]), OPTIONS_END);
      i = end;
      continue;
    }
    const m = START.exec(lines[i]);
    if (!m) continue;
    const end = lines.indexOf(END, i + 1);
    if (end < 0) throw new Error(`README line ${i + 1}: example "${m[1]}" has no ${END}`);
    const spec = parseExample(m[1]);
    const output = await runExample(spec);
    if (spec.markdown) out.push('', output, '', END);
    else out.push('```text', output, '```', END);
    i = end;
  }
  return out.join('\n');
}

/** The project's README.md (found from this file, in scripts/ or compiled under dist/scripts/). */
export function readmePath(): string {
  return readmePathFrom(dirname(fileURLToPath(import.meta.url)));
}

function readmePathFrom(start: string): string {
  let dir = start;
  for (let k = 0; k < 4; k++) {
    if (existsSync(join(dir, 'package.json'))) return join(dir, 'README.md');
    dir = resolve(dir, '..');
  }
  throw new Error(`README.md not found above ${start}`);
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const path = readmePath();
  const before = readFileSync(path, 'utf8');
  const after = await renderReadme(before);
  if (after !== before) writeFileSync(path, after);
  console.log(after === before ? 'README.md examples are up to date' : 'README.md examples regenerated');
}
