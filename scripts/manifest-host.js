'use strict';
/**
 * The host the add-in is served from. manifest.xml at the repository root points every URL at the
 * development host https://localhost:3000; the build writes dist/manifest.xml with that host
 * replaced by SUNPANE_HOST (for deploying dist/ to a static HTTPS host).
 */

/** The host written in the committed manifest.xml template. */
const DEV_HOST = 'https://localhost:3000';

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

module.exports = { DEV_HOST, resolveHost, manifestForHost };
