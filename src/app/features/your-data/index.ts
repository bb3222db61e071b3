// The export buttons, offered before an account is deleted.
export { ExportPanel } from './export-panel/export-panel';
