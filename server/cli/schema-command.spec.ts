import { describe, expect, it } from 'vitest';
import { runCli } from './spawn-cli';

describe('borewright schema', () => {
  it('prints the JSON Schema of the job document', () => {
    const { code, stdout } = runCli('schema');
    expect(code).toBe(0);
    const schema = JSON.parse(stdout);
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.properties.format).toMatchObject({ const: 'borewright.job/1' });
  });

  it('refuses arguments it does not take', () => {
    expect(runCli('schema', 'extra').code).toBe(2);
  });
});
