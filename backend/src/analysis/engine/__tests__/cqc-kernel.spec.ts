import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { CQC_KERNEL_WASM_BASE64 } from '../cqc-kernel.wasm';

describe('the WebAssembly CQC kernel', () => {
  it('is the module cqc-kernel.wat assembles to (npm run build:wasm)', () => {
    const script = join(__dirname, '..', '..', '..', '..', 'scripts', 'build-wasm.mjs');
    const output = execFileSync(process.execPath, [script, '--check'], { encoding: 'utf8' });
    expect(output).toContain('matches');
  });

  it('is a valid module with 128-bit SIMD that Node compiles', () => {
    const bytes = Uint8Array.from(atob(CQC_KERNEL_WASM_BASE64), (c) => c.charCodeAt(0));
    expect(WebAssembly.validate(bytes)).toBe(true);
    const exports = new WebAssembly.Instance(new WebAssembly.Module(bytes), {}).exports;
    expect(Object.keys(exports).sort()).toEqual(['memory', 'strictUpperProducts']);
  });
});
