/**
 * Read-only output tables of a design: parts (bill of materials), cuts, drawn stock bars, tools,
 * weight and price. Every component takes its data as props (from `analyzeDesign`) and reads no
 * store, so the editor's dock, the viewer page, the workbench and review pages show the same tables.
 */
export { BarsTab, type BarsTabProps } from './BarsTab';
export { CutsTab, type CutsTabProps } from './CutsTab';
export { PartsTab, BOM_CATEGORY_NAMES, BOM_CATEGORY_ORDER, type PartsTabProps } from './PartsTab';
export { PriceTab } from './PriceTab';
export { ToolsTab } from './ToolsTab';
export { WeightTab } from './WeightTab';
export { FootprintSketch } from './FootprintSketch';
export { StockPlanPicture, type StockPlanPictureProps } from './StockPlanPicture';
export { SortableTable, type SortableTableProps, type ColumnHints } from './SortableTable';
export { CsvButton } from './CsvButton';
export { BOM_CSV_HEADER, bomToCsv, cutListCsvHeader, cutListToCsv, downloadCsv, describeEnd, describeMachining } from './csv';
export * from './format';
