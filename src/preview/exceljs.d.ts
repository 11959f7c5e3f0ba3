/** ExcelJS's browser build has the package's own types (index.d.ts). */
declare module 'exceljs/dist/exceljs.bare.min.js' {
  import * as ExcelJS from 'exceljs';
  export = ExcelJS;
}
