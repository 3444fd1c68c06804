// Checks that a packaged .vsix holds only what the extension needs at run time: the manifest,
// the three bundles, KaTeX's files, the panel's and preview's media, the icon and the docs.
// Reads the zip's central directory directly (no unzip tool needed).
import { readFileSync } from 'node:fs';

export function listZip(path) {
  const buf = readFileSync(path);
  // End of central directory record: signature 0x06054b50, searched from the end.
  let eocd = -1;
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 65557); i--) {
    if (buf.readUInt32LE(i) === 0x06054b50) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw new Error(`${path} is not a zip file`);
  const count = buf.readUInt16LE(eocd + 10);
  let offset = buf.readUInt32LE(eocd + 16);
  const names = [];
  for (let k = 0; k < count; k++) {
    if (buf.readUInt32LE(offset) !== 0x02014b50) throw new Error('corrupt central directory');
    const nameLength = buf.readUInt16LE(offset + 28);
    const extraLength = buf.readUInt16LE(offset + 30);
    const commentLength = buf.readUInt16LE(offset + 32);
    names.push(buf.toString('utf8', offset + 46, offset + 46 + nameLength));
    offset += 46 + nameLength + extraLength + commentLength;
  }
  return names;
}

const allowed = [
  /^\[Content_Types\]\.xml$/,
  /^extension\.vsixmanifest$/,
  /^extension\/(package\.json|readme\.md|changelog\.md|LICENSE\.txt|LICENSE)$/i,
  /^extension\/dist\/(extension|server|checkWorker)\.js$/,
  /^extension\/dist\/katex\/(katex\.min\.(js|css)|fonts\/KaTeX_[A-Za-z0-9_-]+\.(woff2?|ttf))$/,
  /^extension\/media\/(icon\.png|panel\.(css|js)|preview\.css|walkthrough\/[a-z-]+\.md)$/,
];
const required = ['extension/package.json', 'extension/dist/extension.js', 'extension/dist/server.js', 'extension/dist/checkWorker.js', 'extension/media/icon.png'];

if (process.argv[1] && import.meta.url.endsWith(process.argv[1].split('/').pop())) {
  const path = process.argv[2] ?? 'dist/matrix-notary.vsix';
  const names = listZip(path);
  const unexpected = names.filter((n) => !allowed.some((re) => re.test(n)));
  const missing = required.filter((r) => !names.includes(r));
  if (unexpected.length || missing.length) {
    if (unexpected.length) console.error(`Files in ${path} that the extension does not need at run time:\n  ${unexpected.join('\n  ')}`);
    if (missing.length) console.error(`Files missing from ${path}:\n  ${missing.join('\n  ')}`);
    process.exit(1);
  }
  console.log(`${path}: ${names.length} files, all needed at run time.`);
}
