/** CSV: a tank's water tests imported from a spreadsheet, and its history exported as one. */
export { csvExportRouter } from './csv-export.router';
export { csvImportRouter, IMPORT_ROUTES_PREFIX } from './csv-import.router';
