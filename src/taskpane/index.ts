/**
 * The shared runtime page's entry: registers the custom functions and mounts the pane.
 * taskpane.html loads office.js before this bundle (from the CDN in production, a local
 * copy in development; scripts/pane-page.js).
 */
import { registerAll } from '../functions/excel/register';
import { mountPane } from './pane';
import { excelPort } from './ports/excel';

// Associate while the bundle loads, not after Office.onReady: in the shared runtime Excel
// can ask for a function as soon as the page starts, and this is also when the metadata
// plugin's own generated associate calls would run. office.js defines
// CustomFunctions.associate synchronously; it is absent only when office.js failed to load.
if (typeof CustomFunctions !== 'undefined') registerAll();

function paneRoot(): HTMLElement {
  return document.getElementById('starpoint-pane') ?? document.body;
}

if (typeof Office !== 'undefined') {
  void Office.onReady((info) => {
    // Outside Office (page opened in a browser) host is null: reference only, no port.
    mountPane(paneRoot(), info.host === Office.HostType.Excel ? excelPort : null);
  });
} else {
  mountPane(paneRoot(), null);
}
