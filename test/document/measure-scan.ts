/**
 * Measures document scanning on large generated notes and prints the rates (no assertions:
 * timings depend on the machine). Run: `npx tsx test/document/measure-scan.ts [megabytes]`.
 */
import { scanDocument } from '../../src/document/index';

const megabytes = Number(process.argv[2] ?? 5);
const target = megabytes * 1_000_000;

const latexParagraph = (i: number): string =>
  `Paragraph ${i}: the state matrix $A_{${i}} = \\begin{pmatrix} 1 & ${i} \\\\ 0 & 1 \\end{pmatrix}$ gives \\(\\det A = 1\\). % a remark\n` +
  `\\begin{align*}\n\\operatorname{tr} A &= 2 \\\\\n&= 1 + 1\n\\end{align*}\n` +
  `Some prose about the model, its damping and its modes, with costs of \\$${i} and 5\\% margins, and \\[e^{At} = I + At\\].\n\n`;

const markdownParagraph = (i: number): string =>
  `Paragraph ${i}: the state matrix $A_{${i}} = \\begin{pmatrix} 1 & ${i} \\\\ 0 & 1 \\end{pmatrix}$ gives \\(\\det A = 1\\). A \`code $span$\`.\n\n` +
  `$$\n\\operatorname{tr} A = 2\n$$\n\n` +
  '```notary\nB = [[1, 2], [3, 4]]\n\\det B = -2\n```\n\n' +
  `Some prose about the model, its damping and its modes, with costs of \\$${i}, and \\[e^{At} = I + At\\].\n\n`;

function build(paragraph: (i: number) => string): string {
  const parts: string[] = [];
  let length = 0;
  for (let i = 0; length < target; i++) {
    const p = paragraph(i);
    parts.push(p);
    length += p.length;
  }
  return parts.join('');
}

for (const [language, paragraph] of [
  ['latex', latexParagraph],
  ['markdown', markdownParagraph],
] as const) {
  const text = build(paragraph);
  const started = performance.now();
  const cpu = process.cpuUsage();
  const result = scanDocument(text, language);
  const seconds = (performance.now() - started) / 1000;
  const used = process.cpuUsage(cpu);
  const cpuSeconds = Number(((used.user + used.system) / 1e6).toFixed(2));
  const rate = (text.length / 1e6 / seconds).toFixed(2);
  console.log(JSON.stringify({ language, characters: text.length, regions: result.regions.length, problems: result.problems.length, seconds: Number(seconds.toFixed(2)), cpuSeconds, megabytesPerSecond: Number(rate) }));
}

// One paragraph with no blank line at all: the LaTeX scanner hands it to the local scanner.
const oneParagraph = latexParagraph(0).replace(/\n\n/g, '\n').repeat(Math.ceil(target / latexParagraph(0).length));
const started = performance.now();
const result = scanDocument(oneParagraph, 'latex');
console.log(JSON.stringify({ language: 'latex, one paragraph', characters: oneParagraph.length, regions: result.regions.length, seconds: Number(((performance.now() - started) / 1000).toFixed(2)) }));
