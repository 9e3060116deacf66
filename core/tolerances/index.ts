export type { Found, Lookup, NotFound, ToleranceGrade } from './lookup';
export type { Band } from './bands';
export type { Interpolation } from './grid';
export { coilDiameterTable, coilDiameterTolerance, indexBands } from './en15800-coil-diameter';
export { endSquarenessTable, endSquarenessTolerance } from './en15800-ends';
export type { EndSquareness } from './en15800-ends';
export { commercialOdTable, commercialOdTolerance } from './commercial-od';
export {
  checkShopToleranceTable, demoFreeLengthTolerances, demoLoadTolerances, freeLengthTolerance, loadTolerance,
} from './shop-tables';
export type { FreeLengthTolerance, PlusMinus, ShopToleranceRow, ShopToleranceTable } from './shop-tables';
export {
  checkPlusMinusTable, demoFreeAngleTolerances, demoLegLengthTolerances, demoShopTables, plusMinusTolerance, shopTableLabels,
} from './shop-tables';
export type { PlusMinusRow, PlusMinusTable, ShopTables } from './shop-tables';
export { demoStoredShopTables, shopTablesOf } from './shop-settings';
export type { StoredShopTables } from './shop-settings';
export { din2097LengthTable, din2097LengthTolerance } from './extension-din2097';
export { extensionLoadTable, extensionLoadTolerance } from './extension-load';
export {
  extensionFreeLengthTable, extensionFreeLengthTolerance, loopPositionTable, loopPositionTolerance,
} from './extension-trade';
