/**
 * The address a production manifest points at. manifest/manifest.xml names the dev server
 * (https://localhost:3000); `npm run build` with STARPOINT_PUBLIC_URL set writes that
 * address instead into dist/manifest.xml. Used by webpack.config.js; tested in
 * test/scripts/public-url.test.ts.
 */

/** The dev server address every URL of manifest/manifest.xml starts with. */
const DEV_URL = 'https://localhost:3000';

/** Longest URL the manifest schema allows (OfficeAppBasicTypes `URL`: 1 to 2048 characters, MS-OWEMXML). */
const MAX_URL = 2048;

const EXAMPLE = 'https://addins.example.org/starpoint';

/**
 * Reads STARPOINT_PUBLIC_URL: `null` when it is unset or blank; otherwise the address as an
 * absolute https URL without a trailing slash. Throws an Error that says what to give for
 * anything else: not a URL, not https (Office loads add-ins over HTTPS only), a query or
 * fragment (the manifest appends file names to it), or a user name or password.
 *
 * @param {string | undefined} raw the variable's value
 * @returns {string | null}
 */
function publicUrl(raw) {
  const text = (raw ?? '').trim();
  if (text === '') return null;
  if (!/^https:\/\//i.test(text)) {
    throw new Error(`STARPOINT_PUBLIC_URL must be an absolute address starting with https:// (Office loads add-ins over HTTPS only): "${text}". Give e.g. ${EXAMPLE}`);
  }
  let url;
  try {
    url = new URL(text);
  } catch {
    throw new Error(`STARPOINT_PUBLIC_URL is not a valid URL: "${text}". Give e.g. ${EXAMPLE}`);
  }
  if (url.hostname === '') throw new Error(`STARPOINT_PUBLIC_URL has no host name: "${text}". Give e.g. ${EXAMPLE}`);
  if (url.search || url.hash || /[?#]/.test(text)) {
    throw new Error(`STARPOINT_PUBLIC_URL must not have a query (?…) or fragment (#…); the manifest adds file names to it: "${text}"`);
  }
  if (url.username || url.password) throw new Error(`STARPOINT_PUBLIC_URL must not carry a user name or password: "${text}"`);
  return url.href.replace(/\/+$/, '');
}

/** The text of a value for an XML attribute or element: & < > " ' as entities. */
function escapeXml(text) {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]);
}

/**
 * The manifest with every dev server address replaced by `base` (from `publicUrl`),
 * escaped for XML. Throws when a resulting URL would be longer than the schema allows.
 *
 * @param {string} xml manifest/manifest.xml
 * @param {string} base an address from publicUrl
 * @returns {string}
 */
function rewriteManifest(xml, base) {
  const escaped = escapeXml(base);
  const out = xml.replaceAll(DEV_URL, escaped);
  for (const m of out.matchAll(/"(https:\/\/[^"]*)"/g)) {
    const url = m[1].replace(/&(amp|lt|gt|quot|apos);/g, 'x');
    if (url.length > MAX_URL) {
      throw new Error(`STARPOINT_PUBLIC_URL is too long: the manifest URL ${m[1].slice(0, 60)}… would have ${url.length} characters; the schema allows ${MAX_URL}.`);
    }
  }
  return out;
}

/** The warning a production build without STARPOINT_PUBLIC_URL gives. */
function missingUrlWarning() {
  return (
    `STARPOINT_PUBLIC_URL is not set, so dist/manifest.xml still points at ${DEV_URL}: that manifest works only ` +
    `on this machine with npm start running. For a manifest you can publish, build with the add-in's https address, ` +
    `e.g. STARPOINT_PUBLIC_URL=${EXAMPLE} npm run build`
  );
}

module.exports = { DEV_URL, MAX_URL, publicUrl, escapeXml, rewriteManifest, missingUrlWarning };
