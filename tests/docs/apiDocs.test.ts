// Every function a user can call (every export of `ionheat` and `ionheat/node`
// whose runtime value is a function, classes included) carries the TSDoc the
// house asks for (DEVELOPERS.md, "Documentation that runs"):
// - an @example with a ```ts block (tests/docs/examples.test.ts runs it and
//   requires it to assert at least one value);
// - an @see naming the published source (a data/sources.json key or the
//   paper) or, for plumbing with no science in it, where the convention it
//   follows is written down;
// - an @param for every parameter (the text gives the unit where there is one).
// The declarations are found with the TypeScript compiler API, following
// re-exports to the file that declares each name, so a doc comment cannot
// hide in the wrong place.
import { join, relative } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import * as core from '../../src/index.js';
import * as nodeEntry from '../../src/node/index.js';

const root = join(import.meta.dirname, '..', '..');
const entries = [
  { name: 'ionheat', file: join(root, 'src', 'index.ts'), runtime: core as Record<string, unknown> },
  { name: 'ionheat/node', file: join(root, 'src', 'node', 'index.ts'), runtime: nodeEntry as Record<string, unknown> },
];

const program = ts.createProgram(
  entries.map((e) => e.file),
  {
    target: ts.ScriptTarget.ES2022,
    module: ts.ModuleKind.ESNext,
    moduleResolution: ts.ModuleResolutionKind.Bundler,
    resolveJsonModule: true,
    strict: true,
    noEmit: true,
    types: [],
  },
);
const checker = program.getTypeChecker();

interface Documented {
  entry: string;
  name: string;
  where: string;
  tags: readonly ts.JSDocTag[];
  parameters: string[];
}

function parameterNames(node: ts.SignatureDeclaration): string[] {
  return node.parameters.map((p) => p.name.getText());
}

/** The parameters a declaration takes: a function's, an arrow function's, or a class constructor's. */
function parametersOf(decl: ts.Declaration): string[] {
  if (ts.isFunctionDeclaration(decl)) return parameterNames(decl);
  if (ts.isVariableDeclaration(decl) && decl.initializer && (ts.isArrowFunction(decl.initializer) || ts.isFunctionExpression(decl.initializer))) {
    return parameterNames(decl.initializer);
  }
  if (ts.isClassDeclaration(decl)) {
    const ctor = decl.members.find(ts.isConstructorDeclaration);
    return ctor ? parameterNames(ctor) : [];
  }
  return [];
}

/** JSDoc tags of a declaration; a class's constructor comment counts for the class. */
function tagsOf(decl: ts.Declaration): ts.JSDocTag[] {
  const tags = [...ts.getJSDocTags(decl)];
  if (ts.isClassDeclaration(decl)) {
    const ctor = decl.members.find(ts.isConstructorDeclaration);
    if (ctor) tags.push(...ts.getJSDocTags(ctor));
  }
  return tags;
}

function documentedExports(): Documented[] {
  const found: Documented[] = [];
  for (const entry of entries) {
    const source = program.getSourceFile(entry.file);
    if (!source) throw new Error(`cannot read ${entry.file}`);
    const moduleSymbol = checker.getSymbolAtLocation(source);
    if (!moduleSymbol) throw new Error(`${entry.file} is not a module`);
    for (const symbol of checker.getExportsOfModule(moduleSymbol)) {
      const name = symbol.getName();
      if (typeof entry.runtime[name] !== 'function') continue;
      const target = symbol.flags & ts.SymbolFlags.Alias ? checker.getAliasedSymbol(symbol) : symbol;
      const declarations = (target.declarations ?? []).filter((d) => !ts.isSourceFile(d));
      if (declarations.length === 0) throw new Error(`${entry.name}: cannot find where ${name} is declared`);
      const first = declarations[0]!;
      const file = relative(root, first.getSourceFile().fileName);
      const line = first.getSourceFile().getLineAndCharacterOfPosition(first.getStart()).line + 1;
      const parameters = [...new Set(declarations.flatMap(parametersOf))];
      found.push({ entry: entry.name, name, where: `${file}:${line}`, tags: declarations.flatMap(tagsOf), parameters });
    }
  }
  return found;
}

function tagText(tag: ts.JSDocTag): string {
  const comment = tag.comment;
  if (comment === undefined) return '';
  return typeof comment === 'string' ? comment : comment.map((part) => part.text).join('');
}

const documented = documentedExports();

/**
 * The runtime names of `ionheat`, deliberately: what users call and the constants they compare with. Internals
 * (estimator calibrations, the bases of dissolve one by one, Ewald cells, the spec syntax tree, zod schemas) stay
 * inside; a name added or removed here is a change of the public face, and goes into the CHANGELOG.
 */
const PUBLIC_VALUES = [
  'CONTACT_BURN_THRESHOLD_C', 'DEFAULT_START_C', 'Dataset', 'FROSTBITE_THRESHOLD_C', 'IonheatError', 'bestLatticeEstimate', 'bornHaberCycle', 'bornLande',
  'bornMayer', 'brineFreezingPoint', 'builtinDataset', 'cautionLine', 'chargeType', 'compileSpec', 'constants', 'createScreener', 'cycleDiagram', 'dissolve', 'enumerate',
  'errorCodes', 'findIon', 'formatEstimate', 'formatSalt', 'freezingPointOfSolution', 'glasserLatticeEnergy', 'hazardSummary', 'heatPerGramOfFill',
  'heatPerGramOfSalt', 'integralEnthalpyOfSolution', 'intervalChart', 'ionHydrationEnthalpy', 'ionsPerFormulaUnit', 'isIonheatError', 'kapustinskii',
  'kirchhoffCorrection', 'latentWarmer', 'latticeEstimate', 'latticeEstimates', 'latticeMethods', 'makeEstimate', 'molarMass', 'packCurveSvg',
  'packDesignMargin', 'packFinalTemperature', 'packRatioCurve', 'packTimeCourse', 'parseFillSpec', 'parseSalt', 'probabilityPositive',
  'ratioForLargestChangePerGram', 'ratioForTargetTemperature', 'roundEstimate', 'roundToUncertainty', 'saltHazards', 'saltHydrationEnthalpy',
  'saltSolubility', 'saturatedFill', 'screen', 'screenOutputJsonSchema', 'screenStream', 'solubilityAt', 'solubilityCurve', 'solubilityFromProduct',
  'solutionHeatCapacity', 'solutionVerdict', 'timeCourseSvg', 'tryLatticeEstimate', 'vbtLatticeEnergy', 'warmerCourseSvg',
];

describe('the public face', () => {
  it('exports exactly the deliberate list of values', () => {
    expect(Object.keys(core).sort()).toEqual([...PUBLIC_VALUES].sort());
  });
  it('exports no zod schema and no internal numerics', () => {
    const values = core as Record<string, unknown>;
    for (const [name, value] of Object.entries(values)) expect(typeof value === 'object' && value !== null && 'safeParse' in value, `${name} is a zod schema`).toBe(false);
    for (const internal of ['normalCdf', 'ewaldMadelung', 'idealCell', 'parseSpec', 'latticeCalibration', 'packCautions']) expect(values[internal]).toBeUndefined();
  });
});

describe('TSDoc of every exported function', () => {
  it('finds the public functions of both entries', () => {
    // A floor, so that a broken scan (finding nothing) cannot pass.
    expect(documented.filter((d) => d.entry === 'ionheat').length).toBeGreaterThan(50);
    expect(documented.filter((d) => d.entry === 'ionheat/node').map((d) => d.name)).toEqual(
      expect.arrayContaining(['loadDataset', 'applyOverrideDocument', 'parseJsonStrict', 'runCli']),
    );
  });

  for (const d of documented) {
    describe(`${d.entry} ${d.name} (${d.where})`, () => {
      it('has an @example with a ts code block', () => {
        const examples = d.tags.filter((t) => t.tagName.text === 'example');
        expect(examples.length, `${d.name} has no @example`).toBeGreaterThan(0);
        expect(examples.some((t) => tagText(t).includes('```ts')), `${d.name}: the @example has no \`\`\`ts block`).toBe(true);
      });
      it('names its source with @see', () => {
        const see = d.tags.filter((t) => t.tagName.text === 'see');
        expect(see.length, `${d.name} has no @see`).toBeGreaterThan(0);
        // TypeScript reads a leading name of an @see as a reference, so look at the whole tag.
        expect(see.every((t) => t.getText().replace(/^@see/, '').replace(/[\s*]/g, '').length > 3), `${d.name}: an @see is empty`).toBe(true);
      });
      it('documents every parameter with @param', () => {
        const params = new Set(d.tags.filter(ts.isJSDocParameterTag).map((t) => t.name.getText()));
        const missing = d.parameters.filter((p) => !params.has(p));
        expect(missing, `${d.name}: no @param for ${missing.join(', ')}`).toEqual([]);
      });
    });
  }
});
