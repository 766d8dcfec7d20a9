/** Code to paste, per correlation: Python, JavaScript (+ TypeScript declarations), C99 and a spreadsheet formula. */
export { snippetSource, type SnippetSource } from './snippetSource.ts';
export { snippetModel } from './snippetModel.ts';
export { pythonSnippet } from './pythonSnippet.ts';
export { javascriptSnippet, javascriptTypes } from './javascriptSnippet.ts';
export { cSnippet } from './cSnippet.ts';
export { spreadsheetFormula, spreadsheetSnippet, SPREADSHEET_X_NAME } from './spreadsheetFormula.ts';
export { identifier as snippetIdentifier } from './snippetText.ts';
