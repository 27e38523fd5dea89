'use strict';
/**
 * The host the add-in is served from, and which of its two identities a manifest carries.
 * manifest.xml at the repository root is the DEVELOPMENT manifest: every URL on
 * https://localhost:3000, its own Id and the display name "Sunpane (development)", so that it can be
 * installed beside the released add-in. A production build (`npm run build`) writes
 * dist/manifest.xml with the production Id and display name and the host replaced by SUNPANE_HOST;
 * a development build (`npm run build:dev`, the dev server) keeps the development identity.
 */

/** The host written in the committed manifest.xml template. */
const DEV_HOST = 'https://localhost:3000';

/** The two identities: Id (a GUID Office keys installed add-ins by) and the name users see. */
const IDENTITIES = Object.freeze({
  development: Object.freeze({ id: '52d5cd48-d489-440c-988d-690fad75766a', displayName: 'Sunpane (development)' }),
  production: Object.freeze({ id: 'cf809c33-94a2-4fef-abc6-210ec9a0d4fd', displayName: 'Sunpane' }),
});

/**
 * Checks and normalises a host: an https origin, optionally with a path prefix, no trailing slash.
 * @param {string | undefined} value - SUNPANE_HOST, or undefined for the development host
 * @returns {string}
 */
function resolveHost(value) {
  const host = (value === undefined || value.trim() === '' ? DEV_HOST : value.trim()).replace(/\/+$/, '');
  let url;
  try {
    url = new URL(host);
  } catch {
    throw new Error(`SUNPANE_HOST = ${JSON.stringify(value)} is not allowed: must be an https URL such as https://addin.example.org/sunpane`);
  }
  if (url.protocol !== 'https:' || url.search || url.hash) {
    throw new Error(`SUNPANE_HOST = ${JSON.stringify(value)} is not allowed: must be an https URL without query or fragment (Office loads add-ins only over HTTPS)`);
  }
  return host;
}

/**
 * The manifest with every occurrence of the development host replaced.
 * @param {string} xml - manifest.xml as committed
 * @param {string} host - the result of resolveHost
 * @returns {string}
 */
function manifestForHost(xml, host) {
  if (!xml.includes(DEV_HOST)) throw new Error(`manifest.xml does not mention ${DEV_HOST}: nothing to replace`);
  return xml.split(DEV_HOST).join(host);
}

/**
 * The manifest with the identity of `kind` ('development' as committed, or 'production').
 * @param {string} xml - manifest.xml as committed (development identity)
 * @param {'development' | 'production'} kind
 * @returns {string}
 */
function manifestForIdentity(xml, kind) {
  const from = IDENTITIES.development;
  const to = IDENTITIES[kind];
  if (!to) throw new Error(`manifest identity ${JSON.stringify(kind)} is not one of ${Object.keys(IDENTITIES).join(', ')}`);
  const idTag = `<Id>${from.id}</Id>`;
  const nameTag = `<DisplayName DefaultValue="${from.displayName}"/>`;
  if (!xml.includes(idTag) || !xml.includes(nameTag)) throw new Error(`manifest.xml does not carry the development identity (${idTag}, ${nameTag})`);
  return xml.replace(idTag, `<Id>${to.id}</Id>`).replace(nameTag, `<DisplayName DefaultValue="${to.displayName}"/>`);
}

module.exports = { DEV_HOST, IDENTITIES, resolveHost, manifestForHost, manifestForIdentity };
