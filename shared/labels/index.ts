/** Cable labels: the design's scheme, stable labels across versions, and what a printed label holds. */
export {
  assignStableLabels,
  labelHistory,
  labelHistoryData,
  labelHistoryFromData,
  NO_LABEL_HISTORY,
  type LabelHistory,
  type LabelHistoryData,
  type LabelHolder,
} from '@/shared/labels/stable';
export { labelParts, labelScheme, networkTag, type LabelParts, type LabelScheme } from '@/shared/labels/scheme';
export { cableDetailUrl, cableEndLabels, labelSheet, lengthText, type CableEndLabel, type LabelWhere } from '@/shared/labels/content';
export { qrMatrix, qrSvg, QR_QUIET_ZONE_MODULES } from '@/shared/labels/qr';
