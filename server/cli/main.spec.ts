import { describe, expect, it } from 'vitest';
import { runCli } from './spawn-cli';

describe('borewright', () => {
  it('prints its usage with --help and with no command', () => {
    for (const args of [['--help'], []]) {
      const { code, stdout } = runCli(...args);
      expect(code).toBe(0);
      expect(stdout).toContain('Usage: borewright <command>');
      expect(stdout).toMatch(/check <job\.json>[\s\S]*catalog[\s\S]*schema/);
    }
  });

  it('refuses an unknown command and an unknown option with exit code 2', () => {
    const unknown = runCli('drill');
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('no command "drill"');
    const option = runCli('catalog', '--colour');
    expect(option.code).toBe(2);
    expect(option.stderr).toContain("Unknown option '--colour'");
  });
});
