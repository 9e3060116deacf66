import { vi } from 'vitest';
import { sameOutputs } from './engine-same-outputs';

// As under a content security policy without 'unsafe-eval' (the renderer): no code is compiled, the generic walks run.
vi.mock('../../core/generated-code', () => ({ generatedFunction: () => undefined, literal: (key: string) => JSON.stringify(key) }));

sameOutputs('generic walks');
