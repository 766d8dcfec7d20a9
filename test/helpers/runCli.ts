/** Run the CLI in-process and capture what it prints. */
import { vi } from 'vitest';
import { main } from '../../src/cli/main.ts';

export async function runCli(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const log = vi.spyOn(console, 'log').mockImplementation((...parts: unknown[]) => void out.push(parts.join(' ')));
  const error = vi.spyOn(console, 'error').mockImplementation((...parts: unknown[]) => void err.push(parts.join(' ')));
  try {
    const code = await main(args);
    return { code, stdout: out.join('\n'), stderr: err.join('\n') };
  } finally {
    log.mockRestore();
    error.mockRestore();
  }
}
