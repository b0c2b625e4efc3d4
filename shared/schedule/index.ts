/** The build sheet's cable schedule: rows, identifiers, length estimates, stock lengths, materials. */
export { cableSchedule, materialTotals } from '@/shared/schedule/schedule';
export { cableIdentifier, endIdentifier, portNumber } from '@/shared/schedule/identifier';
export { lengthEstimator, roundUpToCentimetre, stockLength, STOCK_LENGTHS_M, type LengthEstimator } from '@/shared/schedule/length';
export { naturalCompare } from '@/shared/schedule/order';
export type { CableSchedule, ScheduleEnd, ScheduleRow, ScheduleTotal } from '@/shared/schedule/types';
export { addressTable, cableTable, exportFileName, guardFormula, materialsTable, ADDRESS_COLUMNS, CABLE_COLUMNS, MATERIAL_COLUMNS, type Cell, type Table } from '@/shared/schedule/tables';
