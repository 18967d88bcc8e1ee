import { spawnSync } from 'node:child_process';

// pdf-parse (a registry package, not our code) loads pdf.js's worker with a dynamic import, which
// jest's module sandbox refuses; it runs in a plain Node child instead.
const SCRIPT = `
const { PDFParse } = require('pdf-parse');
const chunks = [];
process.stdin.on('data', (c) => chunks.push(c));
process.stdin.on('end', async () => {
  const parser = new PDFParse({ data: Buffer.concat(chunks) });
  const { text, total } = await parser.getText();
  await parser.destroy();
  process.stdout.write(JSON.stringify({ text, pages: total }));
});
`;

/** The text of a PDF as pdf-parse extracts it, and its page count. */
export function pdfText(pdf: Buffer): { text: string; pages: number } {
  const run = spawnSync(process.execPath, ['-e', SCRIPT], { input: pdf, cwd: __dirname, encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`pdf-parse failed: ${run.stderr}`);
  return JSON.parse(run.stdout) as { text: string; pages: number };
}
