/**
 * The command line under hostile arguments (issue 7): every command, called
 * in-process through runCli, with arbitrary mixtures of its own options,
 * unknown options, missing values, non-finite and absurd numbers, huge
 * strings, bad formulas and unreadable files. Whatever comes in, a run ends
 * with status 0, 1 (screen: the spec failed) or 2 (bad input) — never 3, an
 * internal error — prints no stack trace, says `ionheat: <problem>` in one
 * line on status 2, and its JSON has no missing or non-finite numbers.
 */
import { rmSync, writeSync } from 'node:fs';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { badNumbers, contractViolation, runInProcess, scratchFiles } from './cliHarness.js';

const dir = scratchFiles();
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The options each command knows (from each command's readArgs call), plus the global ones. */
const OPTIONS: Record<string, string[]> = {
  demo: ['--out'],
  salt: ['--json'],
  lattice: ['--method', '--structure', '--lattice-parameter', '--coordination', '--json'],
  cycle: ['--solve', '--lattice', '--lattice-u', '--formation', '--svg', '--json'],
  dissolve: ['--json', '--exclude-measured', '--temperature'],
  pack: ['--salt', '--salt-mass', '--water', '--start', '--container', '--target', '--json', '--heat-capacity', '--heat-capacity-u', '--kirchhoff', '--monte-carlo', '--seed', '--curve', '--points', '--curve-svg', '--band', '--duration', '--tau', '--ambient', '--g-ambient', '--skin', '--g-skin', '--time-svg'],
  warmer: ['--salt', '--mass', '--extra-water', '--start', '--container', '--ambient', '--g-ambient', '--svg', '--json'],
  screen: ['--enumerate', '--objective', '--direction', '--fill', '--spec', '--format', '--svg', '--exclude-measured'],
  help: [],
};
const COMMANDS = Object.keys(OPTIONS);
const GLOBAL = ['--data', '--help', '--version', '--colour', '--json=1', '-x', '--', '-'];

const HUGE = 'A'.repeat(100_000);
/** Values chosen to break number, formula, file and enumeration parsing. */
const HOSTILE_VALUES = [
  'NaN', 'Infinity', '-Infinity', '1e308', '-1e308', '1e-320', '-0', '0', '-5', '0x10', '1_000', ' ', '', '40', '100', '22', '0.5', '5000',
  'NaCl', 'KNO3', 'NH4NO3', 'CaCl2·6H2O', 'NaXy', '((((((((((Na))))))))))Cl', 'Na999999999Cl999999999', 'Na0Cl', ')(', 'Na+Cl-', '\u0000', 'H₂O',
  HUGE, '('.repeat(10_000), 'cool', 'heat', 'json', 'csv', 'md', 'table', 'kapustinskii', 'rocksalt', 'lattice', 'formation',
  'best.low > 0', 'best.high <', '((((((((((((((((((((((((((((((((((((1))))))))))))))))))))))))))))))))))))', '40:80@22', '40:80@200', '-1:80@22', 'a:b@c',
  'good.csv', 'mixed.csv', 'good.json', 'bad.json', 'proto.json', 'broken.json', 'broken.csv', 'unknown-column.csv', 'empty.csv', 'missing.csv',
  'a-directory.csv', '/nonexistent/dir/x.svg', 'data-good.json', 'data-dup.json', 'data-proto.json', 'data-badvalue.json', 'data-notjson.json',
  'out.svg', '40:50', '50:40', 'enthalpy', 'heat-per-gram', 'fill-temperature', 'cost-per-kj', 'plateau-temperature', 'plateau-duration', 'NaCH3COO·3H2O', 'Na2SO4·10H2O',
];

const optionsOf = (command: string) => [...OPTIONS[command]!, ...GLOBAL];
const hostileValue = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...HOSTILE_VALUES) },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
  { weight: 1, arbitrary: fc.double().map(String) },
);
const token = (command: string) =>
  fc.oneof(
    { weight: 4, arbitrary: fc.constantFrom(...optionsOf(command)) },
    { weight: 5, arbitrary: hostileValue },
    { weight: 1, arbitrary: fc.tuple(fc.constantFrom(...optionsOf(command)), hostileValue).map(([o, v]) => `${o}=${v}`) },
  );

/** A working call of each command, which the mutations below spoil one or two tokens at a time. */
const WORKING: Record<string, string[]> = {
  demo: ['demo'],
  salt: ['salt', 'CaCl2·6H2O', '--json'],
  lattice: ['lattice', 'NaCl', '--json'],
  cycle: ['cycle', 'NaCl', '--json'],
  dissolve: ['dissolve', 'KNO3', '--json', '--temperature', '10'],
  pack: ['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', '100', '--start', '22', '--json'],
  warmer: ['warmer', '--salt', 'Na2S2O3·5H2O', '--mass', '50', '--extra-water', '5', '--start', '22', '--json'],
  screen: ['screen', 'good.csv', '--format', 'json', '--fill', '40:80@22', '--spec', 'best.low > 0'],
  help: ['help', 'pack'],
};

/** Replaces, inserts or deletes tokens of a working call (never the command name). */
const mutated = (command: string) =>
  fc
    .array(fc.tuple(fc.constantFrom('replace', 'insert', 'delete'), fc.nat(), token(command)), { minLength: 1, maxLength: 2 })
    .map((edits) => {
      const argv = [...WORKING[command]!];
      for (const [kind, at, t] of edits) {
        const i = 1 + (at % Math.max(1, argv.length - 1));
        if (kind === 'replace' && i < argv.length) argv[i] = t;
        else if (kind === 'insert') argv.splice(i, 0, t);
        else if (kind === 'delete' && i < argv.length) argv.splice(i, 1);
      }
      return argv;
    });

/** Numbers at the edges of what the options accept, as text. */
const edgeNumber = fc.oneof(
  fc.constantFrom('0', '-0', '0.001', '1e-6', '1e-320', '0.5', '5', '39.99', '99.99', '1000', '1e5', '999999', '1e6', '-40', '-273.15'),
  fc.double({ min: -1e3, max: 1e6, noNaN: true }).map(String),
);

/** A working call with the value of one of its options (or of an added numeric option) set to an edge number. */
const edged = (command: string) =>
  fc.tuple(fc.nat(), fc.constantFrom(...OPTIONS[command]!.concat(['--data'])), edgeNumber, fc.boolean()).map(([at, option, value, add]) => {
    const argv = [...WORKING[command]!];
    const values = argv.flatMap((a, i) => (a.startsWith('--') && i + 1 < argv.length && !argv[i + 1]!.startsWith('--') ? [i + 1] : []));
    if (add || values.length === 0) argv.push(option, value);
    else argv[values[at % values.length]!] = value;
    return argv;
  });

const argvOf = (command: string) =>
  fc.oneof(
    { weight: 2, arbitrary: edged(command) },
    { weight: 2, arbitrary: mutated(command) },
    { weight: 1, arbitrary: fc.array(token(command), { maxLength: 8 }).map((rest) => [command, ...rest]) },
  );

/**
 * JSON paths where null is the documented "nothing here": an object that is
 * absent (no undissolved solid, no clamp, no cycle, no heat capacity of the
 * solution, no band, no fill or spec in the settings) and the two numbers that
 * are null when there is nothing to report (no solubility data → no saturation
 * ratio; a band never entered → no first/last second inside it).
 */
const NULLABLE = new Set([
  '$.cycle',
  '$.temperature.heatCapacityOfSolution',
  '$.hydration.absolute',
  '$.hydration.conventional',
  '$.dissolved[].undissolvedSolid',
  '$.dissolved[].solubility',
  '$.clamp',
  '$.curve[].clamp',
  '$.design.saturationRatio',
  '$.target.design',
  // the margins of a design: null where the target is out of reach, where no mass reaches the line, or no caution is due
  '$.target.margin.designedMassG',
  '$.target.margin.massInterval',
  '$.target.margin.massInterval.high',
  '$.target.margin.finalTemperature',
  '$.target.margin.caution',
  '$.target.margin.threshold.largestSafeMassG',
  '$.timeCourse.band',
  '$.timeCourse.band.firstInsideS',
  '$.timeCourse.band.lastInsideS',
  '$.rechargeTemperature',
  '$.melt.solidOnMelting',
  '$.melt.consequence',
  '$.rows[].warmer.rechargeTemperature',
  '$.settings.fill',
  '$.settings.spec',
  '$.rows[].fill',
  '$.rows[].fill.clamp',
  '$.rows[].fill.dissolved[].undissolvedSolid',
  '$.rows[].fill.dissolved[].solubility',
]);

/** Checks one run against the contract and, for JSON output, its numbers. */
function check(argv: string[], run: Awaited<ReturnType<typeof runInProcess>>): void {
  const violation = contractViolation(argv, run);
  if (violation) throw new Error(violation);
  const wantsJson = argv.includes('--json') || argv.some((a, i) => (a === '--format' && argv[i + 1] === 'json') || a === '--format=json');
  if (wantsJson && run.out.trim().startsWith('{')) {
    if (/\bNaN\b|\bInfinity\b/.test(run.out.replace(/"(?:[^"\\]|\\.)*"/g, '""'))) throw new Error(`ionheat ${argv.join(' ')}: NaN or Infinity in the JSON output`);
    const bad = badNumbers(JSON.parse(run.out), NULLABLE);
    if (bad.length > 0) throw new Error(`ionheat ${argv.join(' ').slice(0, 200)}: null where a number belongs at ${[...new Set(bad)].join(', ')}`);
  }
}

describe('the command line under hostile arguments', () => {
  for (const command of COMMANDS) {
    it(`${command}: any argv ends with status 0/1/2, a one-line "ionheat:" message, no stack trace, finite JSON numbers`, async () => {
      await fc.assert(
        fc.asyncProperty(argvOf(command), async (argv) => {
          // IONHEAT_CLI_TRACE=1 prints each call before it runs and its outcome after (to find a call that hangs).
          if (process.env.IONHEAT_CLI_TRACE) writeSync(2, `START ${JSON.stringify(argv).slice(0, 400)}\n`);
          const run = await runInProcess(argv, dir);
          if (process.env.IONHEAT_CLI_TRACE) writeSync(2, `TRACE ${run.status} ${argv.join(' ').slice(0, 120)} :: ${run.err.split('\n')[0]!.slice(0, 120)}\n`);
          check(argv, run);
        }),
        { numRuns: command === 'demo' ? 10 : command === 'pack' || command === 'screen' ? 150 : 80 },
      );
    });
  }

  // Named cases: each was, or could easily be, a failure; they run on every seed.
  const named: [string[], RegExp][] = [
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '1e308', '--water', '100', '--json'], /^ionheat: --salt-mass: .*at most/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', '1e308'], /^ionheat: --water: .*at most/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', '100', '--container', '1e308'], /^ionheat: --container: .*at most/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', '100', '--heat-capacity', '1e308'], /^ionheat: --heat-capacity: .*at most/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', 'NaN', '--water', '100'], /^ionheat: --salt-mass needs a number, got "NaN"/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', 'Infinity'], /^ionheat: --water needs a number, got "Infinity"/],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '-0', '--water', '100'], /^ionheat: --salt-mass: the mass of NH4NO3 must be at least 0.001 g/],
    [['dissolve', 'NaCl', '--temperature', '1e308'], /^ionheat: .*temperature/],
    [['dissolve', 'Na999999999Cl999999999'], /^ionheat: the count 999999999 at position 3 is too large/],
    [['salt', HUGE], /^ionheat: the formula is 100000 characters long/],
    [['salt', '('.repeat(10_000)], /^ionheat: the formula is 10000 characters long/],
    [['screen', 'missing.csv'], /^ionheat: .*missing\.csv/],
    [['screen', 'a-directory.csv'], /^ionheat: .*a-directory\.csv/],
    [['screen', 'broken.json'], /^ionheat: .*broken\.json/],
    [['screen', 'good.csv', '--spec', HUGE], /^ionheat: spec: an expression is at most 1000 characters/],
    [['screen', 'good.csv', '--fill', HUGE], /^ionheat: fill: write a fill as/],
    [['dissolve', 'NaCl', '--data', 'data-dup.json'], /^ionheat: data-dup\.json, line 1: the key "tables" appears twice/],
    [['dissolve', 'NaCl', '--data', 'missing.json'], /^ionheat: cannot read data file .*missing\.json/],
    [['dissolve', 'NaCl', '--data'], /^ionheat: --data needs a file name/],
    [['cycle', 'NaCl', '--svg', '/nonexistent/dir/x.svg'], /^ionheat: .*x\.svg/],
    // Found with IONHEAT_FC_SEED=4: JSON.parse quotes the file's text, newlines and all, in its message.
    [['salt', 'NaCl', '--data=good.csv'], /^ionheat: good\.csv: not valid JSON at line 1, column 1 \(.*\)\n$/],
    [['screen', 'broken.csv', '--data', 'mixed.csv'], /^ionheat: mixed\.csv: not valid JSON/],
  ];
  // Fresh input files: the random runs above may have written charts over the scratch files.
  const clean = scratchFiles();
  afterAll(() => rmSync(clean, { recursive: true, force: true }));
  it.each(named.map(([argv, message]): [string, string[], RegExp] => [argv.map((a) => (a.length > 40 ? `<${a.length} characters>` : a)).join(' '), argv, message]))('ionheat %s: exit 2 with the problem named', async (_, argv, message) => {
    const run = await runInProcess(argv, clean);
    check(argv, run);
    expect(run.status).toBe(2);
    expect(run.err).toMatch(message);
  });
});
