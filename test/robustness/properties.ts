/**
 * The robustness properties, shared by `npm test` (a few thousand cases in all) and `npm run fuzz`
 * (scripts/fuzz.mjs, 100,000 cases or more): the notation parser, the document scanner and the
 * whole checker never throw on any input, the checker always answers within its budget with one
 * of the three verdicts, and every range they report lies inside the document.
 *
 * "Within its budget" is asserted as: the call returns (the budget is a small `timeBudgetMs`, so a
 * claim that would run long is cut off as `unchecked`), never as a measured duration.
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { createChecker } from '../../src/checks/index';
import { scanDocument, type MathRegion } from '../../src/document/index';
import { childrenOf, parseMathExpression, parseNotaryLine, splitStatements, toLatex, toPlainText, type Expr, type Problem, type RegionKind } from '../../src/notation/index';
import { looseMath, mutatedNote, pieceDocument, type GeneratedNote } from './arbitraries';
import { assertCheckedDocument, assertRange, smallBudget, sourceNotes } from './support';

/** A named property with the number of runs it gets in the test suite and in the fuzz run. */
export interface NamedProperty {
  readonly name: string;
  readonly property: fc.IRawProperty<unknown[], false>;
  /** Runs in `npm test`: chosen so this folder stays well under 20 s on a loaded 2-core machine. */
  readonly testRuns: number;
  /** Share of the fuzz run's cases (the fuzz run gives each property `weight × total` runs). */
  readonly fuzzWeight: number;
}

/** Forgets a property's argument types so properties of different shapes share one list. */
function erase<Ts extends unknown[]>(property: fc.IRawProperty<Ts, false>): fc.IRawProperty<unknown[], false> {
  return property as unknown as fc.IRawProperty<unknown[], false>;
}

/** Every node's range lies inside [lo, hi] and inside its parent's; printing never throws. */
function assertTree(source: string, root: Expr, lo: number, hi: number, what: string): void {
  const stack: [Expr, number, number][] = [[root, lo, hi]];
  while (stack.length) {
    const [e, a, b] = stack.pop()!;
    assert.ok(Number.isInteger(e.start) && Number.isInteger(e.end), `${what}: integer range on ${e.kind}`);
    assert.ok(a <= e.start && e.start <= e.end && e.end <= b, `${what}: ${e.kind} [${e.start}, ${e.end}) outside its parent [${a}, ${b}]`);
    for (const kid of childrenOf(e)) stack.push([kid, e.start, e.end]);
  }
  assertRange(source, root.start, root.end, what);
  toLatex(root);
  toPlainText(root);
}

function assertProblems(source: string, problems: readonly Problem[], lo: number, hi: number, what: string): void {
  for (const p of problems) {
    assert.ok(lo <= p.start && p.start <= p.end && p.end <= hi, `${what}: problem ${p.code} [${p.start}, ${p.end}) outside [${lo}, ${hi}]`);
    assert.ok(p.code.startsWith('notation.') && p.message.length > 0, `${what}: problem ${p.code} has a notation code and a message`);
  }
  void source;
}

/** The parser on loose math placed inside a longer text: spans and problems stay inside. */
function checkParser(math: string, kind: RegionKind): void {
  const prefix = 'Let 𝔸 be $';
  const doc = `${prefix}${math}$ — fin.`;
  const lo = prefix.length;
  const hi = lo + math.length;
  const parsed = parseMathExpression(doc, lo, hi);
  assertTree(doc, parsed.expr, lo, hi, 'parseMathExpression');
  assertProblems(doc, parsed.problems, lo, hi, 'parseMathExpression');
  const split = splitStatements(doc, { start: lo, end: hi, kind });
  assertProblems(doc, split.problems, lo, hi, `splitStatements(${kind})`);
  for (const s of split.statements) {
    assert.ok(lo <= s.start && s.start <= s.end && s.end <= hi, `statement [${s.start}, ${s.end}) outside [${lo}, ${hi}]`);
    for (const t of s.terms) assertTree(doc, t, lo, hi, `splitStatements(${kind}) term`);
    for (const r of s.relations) assert.ok(lo <= r.start && r.start <= r.end && r.end <= hi, 'relation inside the region');
    for (const l of s.links) assert.ok(lo <= l.start && l.start <= l.end && l.end <= hi, 'link inside the region');
  }
  const line = parseNotaryLine(math, 1000);
  assertProblems(doc, line.problems, 1000, 1000 + math.length, 'parseNotaryLine');
  for (const s of line.statements) for (const t of s.terms) assert.ok(1000 <= t.start && t.end <= 1000 + math.length, 'notary line term inside the line');
}

/** Regions are ordered, disjoint and nested correctly; problems are inside. */
function checkScan(note: GeneratedNote): MathRegion[] {
  const { text } = note;
  const scan = scanDocument(text, note.language);
  let previousEnd = 0;
  for (const r of scan.regions) {
    assertRange(text, r.start, r.end, 'region');
    assert.ok(r.start >= previousEnd, `regions overlap or are out of order at ${r.start}`);
    assert.ok(r.start <= r.contentStart && r.contentStart <= r.contentEnd && r.contentEnd <= r.end, `region content [${r.contentStart}, ${r.contentEnd}) inside [${r.start}, ${r.end})`);
    let at = r.contentStart;
    for (const s of r.skips) {
      assert.ok(at <= s.start && s.start <= s.end && s.end <= r.contentEnd, 'skips are sorted, disjoint and inside the content');
      at = s.end;
    }
    for (const l of r.lines ?? []) assert.ok(r.contentStart <= l.start && l.start <= l.end && l.end <= r.contentEnd, 'notary lines inside the content');
    previousEnd = r.end;
  }
  for (const p of scan.problems) {
    assertRange(text, p.start, p.end, `scan problem ${p.code}`);
    assert.notEqual(p.code, 'document.internal-error', `the scanner failed internally: ${p.message}`);
  }
  return scan.regions;
}

/** The whole checker: answers, and every answer keeps the invariants. */
function checkChecker(note: GeneratedNote, timeBudgetMs: number): void {
  const internal: string[] = [];
  const checker = createChecker({ config: smallBudget(timeBudgetMs), log: (m) => internal.push(m) });
  const doc = checker.checkDocument(note.text, note.language);
  assertCheckedDocument(note.text, doc, note.origin);
  // An internal error is turned into `unchecked.internal` so the rest of the note survives, but
  // it is still a bug: the properties treat it as a failure.
  assert.deepEqual(internal, [], `${note.origin}: the checker met an internal error`);
}

/** Hover and panel: describing whatever is at any offset answers or says nothing, inside the document. */
function checkDescribe(note: GeneratedNote, offsetSeed: number, timeBudgetMs: number): void {
  const checker = createChecker({ config: smallBudget(timeBudgetMs) });
  // Half the time on a capital letter or a matrix environment, so descriptions are often found.
  const capitals = [...note.text.matchAll(/[A-Z]|\\begin\{[pbBvV]?matrix/g)].map((m) => m.index ?? 0);
  const offset = offsetSeed % 2 === 0 && capitals.length ? capitals[(offsetSeed >> 1) % capitals.length] : offsetSeed % (note.text.length + 1);
  const d = checker.describeAt(note.text, note.language, offset, { stability: offsetSeed % 4 < 2 ? 'discrete' : 'continuous' });
  if (!d) return;
  assertRange(note.text, d.start, d.end, `${note.origin}: description at ${offset}`);
  assert.ok(d.markdown.length > 0, 'a description has hover text');
  for (const section of d.sections) assert.ok(section.title.length > 0, 'every panel section has a title');
}

/** `decompose` of any text (the command line's MATRIX argument) answers with a result or an error. */
function checkDecompose(source: string, format: 'text' | 'latex' | 'json'): void {
  const r = createChecker({ config: smallBudget(50) }).decompose(source, format);
  if (r.ok) assert.ok(typeof r.text === 'string' && r.text.length > 0, 'a decomposition has text');
  else assert.ok(r.error.length > 0, 'a refusal says why');
  if (format === 'json' && r.ok) JSON.parse(r.text);
}

/** The properties, built over the current fixture notes and examples. */
export function robustnessProperties(): NamedProperty[] {
  const notes = sourceNotes();
  const kinds = fc.constantFrom<RegionKind>('inline', 'display', 'align', 'notary-line');
  return [
    {
      name: 'the notation parser and splitter never throw on loose math and keep every range inside',
      property: erase(fc.property(looseMath, kinds, (math, kind) => checkParser(math, kind))),
      testRuns: 1500,
      fuzzWeight: 0.4,
    },
    {
      name: 'the document scanner never throws on mutated whole notes and keeps regions ordered and inside',
      property: erase(fc.property(mutatedNote(notes, { maxWindow: 0, maxMutations: 8 }), (note) => void checkScan(note))),
      testRuns: 15,
      fuzzWeight: 0.02,
    },
    {
      name: 'the document scanner never throws on mutated note windows and keeps regions ordered and inside',
      property: erase(fc.property(mutatedNote(notes, { maxWindow: 1200, maxMutations: 8 }), (note) => void checkScan(note))),
      testRuns: 120,
      fuzzWeight: 0.1,
    },
    {
      name: 'the document scanner never throws on documents of bare delimiters and fences',
      property: erase(fc.property(pieceDocument, (note) => void checkScan(note))),
      testRuns: 500,
      fuzzWeight: 0.15,
    },
    {
      name: 'the checker answers every mutated note window with valid verdicts, ranges and disjoint fixes',
      property: erase(fc.property(mutatedNote(notes, { maxWindow: 1500, maxMutations: 6 }), (note) => checkChecker(note, 50))),
      testRuns: 160,
      fuzzWeight: 0.2,
    },
    {
      name: 'the checker answers documents of bare delimiters and fences',
      property: erase(fc.property(pieceDocument, (note) => checkChecker(note, 50))),
      testRuns: 400,
      fuzzWeight: 0.1,
    },
    {
      name: 'describing any offset of a mutated note window (hover, panel) answers inside the document or says nothing',
      property: erase(fc.property(mutatedNote(notes, { maxWindow: 3000, maxMutations: 3 }), fc.nat(), (note, offset) => checkDescribe(note, offset, 50))),
      testRuns: 100,
      fuzzWeight: 0.05,
    },
    {
      name: 'decomposing any matrix text (JSON rows, LaTeX, loose math) answers or refuses with a reason',
      property: erase(
        fc.property(
          fc.oneof(
            looseMath,
            fc.json(),
            fc.array(fc.array(fc.oneof(fc.integer({ min: -9, max: 9 }), fc.constantFrom('"1/3"', '"\\\\sqrt{2}"', '0.5', '"x"', 'null')), { minLength: 1, maxLength: 4 }), { minLength: 1, maxLength: 4 }).map((rows) => `[${rows.map((r) => `[${r.join(', ')}]`).join(', ')}]`),
          ),
          fc.constantFrom('text' as const, 'latex' as const, 'json' as const),
          checkDecompose,
        ),
      ),
      testRuns: 300,
      fuzzWeight: 0.03,
    },
  ];
}
