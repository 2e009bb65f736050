import { describe, expect, it } from 'vitest';
import { loadConfig } from './config.js';

describe('settings from the environment', () => {
  it('adds the demo workshop unless RINGSEAT_DEMO says none, and names a bad value', () => {
    expect(loadConfig({}).demo).toBe('demo');
    expect(loadConfig({ RINGSEAT_DEMO: 'none' }).demo).toBe('none');
    expect(() => loadConfig({ RINGSEAT_DEMO: 'maybe' })).toThrow(/RINGSEAT_DEMO/);
  });

  it('adds demo data in production only when RINGSEAT_DEMO asks for it', () => {
    expect(loadConfig({ NODE_ENV: 'production' }).demo).toBe('none');
    expect(loadConfig({ NODE_ENV: 'production', RINGSEAT_DEMO: 'demo' }).demo).toBe('demo');
    expect(loadConfig({ NODE_ENV: 'test' }).demo).toBe('demo');
  });
});
