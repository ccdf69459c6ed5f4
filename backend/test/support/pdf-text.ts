import { execFile } from 'node:child_process';

/**
 * The text of a PDF, read with pdf-parse in a separate Node process: pdf-parse loads pdf.js's
 * worker with a dynamic import, which Jest's module system does not allow without experimental
 * flags, while plain Node does.
 */
export function pdfText(bytes: Buffer): Promise<{ text: string; pages: number }> {
  const script = `
    const { PDFParse } = require('pdf-parse');
    const chunks = [];
    process.stdin.on('data', (c) => chunks.push(c));
    process.stdin.on('end', async () => {
      const parser = new PDFParse({ data: Buffer.concat(chunks) });
      const result = await parser.getText();
      await parser.destroy();
      process.stdout.write(JSON.stringify({ text: result.text, pages: result.total }));
    });`;
  return new Promise((resolve, reject) => {
    const child = execFile(
      process.execPath,
      ['-e', script],
      { cwd: __dirname, maxBuffer: 64 * 1024 * 1024 },
      (error, stdout) => {
        if (error) reject(new Error(`pdf-parse failed: ${error.message}`));
        else resolve(JSON.parse(stdout) as { text: string; pages: number });
      },
    );
    child.stdin?.end(bytes);
  });
}
