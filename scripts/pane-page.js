/**
 * What the add-in's page (taskpane.html: custom functions and pane) loads and allows.
 *
 * Production loads office.js from Microsoft's CDN: "If you plan to publish your Office
 * Add-in from AppSource, you must use this CDN reference. Local references are only
 * appropriate for internal, development, and debugging scenarios" (Referencing the Office
 * JavaScript API library, learn.microsoft.com/office/dev/add-ins/develop/
 * referencing-the-javascript-api-for-office-library-from-its-cdn). office.js then loads its
 * host and locale scripts from its own folder, so the CDN origin is the one origin the
 * page's policy adds to 'self'. Development, the preview and the tests keep the local copy
 * (dist/office-js, copied from @microsoft/office-js) and stay fully offline.
 * Used by webpack.config.js; tested in test/scripts/pane-page.test.ts.
 */

/** The CDN address of office.js, version 1 (the latest release of version 1). */
const OFFICE_JS_CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

/** The local copy beside the page (development builds copy it into dist/office-js). */
const OFFICE_JS_LOCAL = 'office-js/office.js';

/** @param {boolean} production */
function officeJsSrc(production) {
  return production ? OFFICE_JS_CDN : OFFICE_JS_LOCAL;
}

/**
 * The page's Content-Security-Policy: everything from the page's own origin, scripts (and
 * office.js's own frames) also from the office.js CDN origin in production, nothing else. Inline styles are allowed
 * because the pane inserts its stylesheet as a <style>; images also as data:/blob: URLs
 * (plot export).
 *
 * @param {boolean} production
 */
function paneCsp(production) {
  const office = production ? ` ${new URL(OFFICE_JS_CDN).origin}` : '';
  return [
    "default-src 'self'",
    `script-src 'self'${office}`,
    // office.js may open its own trust prompt (AgaveErrorUX/index.html from its folder) in a frame
    `frame-src 'self'${office}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
  ].join('; ');
}

module.exports = { OFFICE_JS_CDN, OFFICE_JS_LOCAL, officeJsSrc, paneCsp };
