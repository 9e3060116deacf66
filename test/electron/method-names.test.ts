import { describe, expect, it } from 'vitest';
import { contract, methodNames } from '../../core/api';
import { DATA_ACTION_CHANNEL, DATA_CANCEL_CHANNEL, DATA_PROGRESS_CHANNEL, MENU_COMMAND_CHANNEL, PDF_PREVIEW_CHANNEL, PDF_SAVE_CHANNEL, apiChannel, apiMethodNames } from '../../core/api/method-names';

describe('the preload method list', () => {
  it('is exactly the contract, in order', () => {
    expect([...apiMethodNames]).toEqual(Object.keys(contract));
    expect([...apiMethodNames]).toEqual(methodNames);
  });

  it('gives every method its own channel, apart from the shell channels', () => {
    const channels = apiMethodNames.map(apiChannel);
    expect(new Set(channels).size).toBe(apiMethodNames.length);
    expect(channels.every((c) => c.startsWith('api:'))).toBe(true);
    for (const shell of [MENU_COMMAND_CHANNEL, PDF_PREVIEW_CHANNEL, PDF_SAVE_CHANNEL, DATA_ACTION_CHANNEL, DATA_PROGRESS_CHANNEL, DATA_CANCEL_CHANNEL]) expect(channels).not.toContain(shell);
  });
});
