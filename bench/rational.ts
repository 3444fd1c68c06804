/**
 * `npx tsx bench/rational.ts`: our lean Rational against mathjs's BigInt-backed Fraction on the
 * work elimination does (a·b − c·d)/e on small rationals, summed in runs of 100 so numbers stay
 * note-sized. Prints the ratio (the decision behind src/engine/rational.ts).
 */
import { fraction, type Fraction } from 'mathjs';
import { Rational } from '../src/engine/rational';

function timeIt(f: () => void, repeats = 5): number {
  const times: number[] = [];
  for (let r = 0; r < repeats; r++) {
    const t = process.hrtime.bigint();
    f();
    times.push(Number(process.hrtime.bigint() - t) / 1e6);
  }
  return times.sort((a, b) => a - b)[Math.floor(repeats / 2)];
}

const N = 60_000;
const nums = Array.from({ length: N }, (_, i) => [BigInt((i * 7919) % 1000) - 500n, BigInt((i * 104729) % 997) + 1n] as const);

const ours = timeIt(() => {
  let acc = Rational.ZERO;
  for (let i = 0; i + 3 < N; i += 4) {
    const a = Rational.of(nums[i][0], nums[i][1]);
    const b = Rational.of(nums[i + 1][0], nums[i + 1][1]);
    const c = Rational.of(nums[i + 2][0], nums[i + 2][1]);
    const d = Rational.of(nums[i + 3][0], nums[i + 3][1]);
    acc = i % 400 === 0 ? Rational.ZERO : acc.add(a.mul(b).sub(c.mul(d)).div(Rational.of(nums[i][1])));
  }
  if (acc.den === 0n) throw new Error('unreachable');
});
const theirs = timeIt(() => {
  let acc: Fraction = fraction(0);
  for (let i = 0; i + 3 < N; i += 4) {
    const a = fraction(Number(nums[i][0]), Number(nums[i][1]));
    const b = fraction(Number(nums[i + 1][0]), Number(nums[i + 1][1]));
    const c = fraction(Number(nums[i + 2][0]), Number(nums[i + 2][1]));
    const d = fraction(Number(nums[i + 3][0]), Number(nums[i + 3][1]));
    acc = i % 400 === 0 ? fraction(0) : acc.add(a.mul(b).sub(c.mul(d)).div(fraction(Number(nums[i][1]))));
  }
});
console.log(`ours ${ours.toFixed(1)} ms, mathjs Fraction ${theirs.toFixed(1)} ms, ratio ours/theirs ${(ours / theirs).toFixed(2)}`);
console.log(JSON.stringify({ oursMs: Number(ours.toFixed(1)), mathjsFractionMs: Number(theirs.toFixed(1)), ratio: Number((ours / theirs).toFixed(2)) }));
