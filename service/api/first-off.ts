import type { firstOffMethods } from '../../core/api/first-off';
import { listFirstOff, recordFirstOff, setCalibration } from '../../db';
import type { StoreContext, TypedHandlers } from './store';

/** First-off records and the set calibration, over the store the service has open. */
export function firstOffHandlers(ctx: StoreContext): TypedHandlers<keyof typeof firstOffMethods> {
  return {
    recordFirstOff: (input) => recordFirstOff(ctx.store, input),
    listFirstOff: (input) => listFirstOff(ctx.store, input.jobId),
    setCalibration: (input) => setCalibration(ctx.store, input),
  };
}
