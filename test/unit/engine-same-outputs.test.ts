import { sameOutputs } from './engine-same-outputs';

sameOutputs('generated functions');
