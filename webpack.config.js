'use strict';
/**
 * Builds the one shared-runtime bundle of the add-in into dist/:
 *   taskpane.js    src/addin.ts (worksheet functions + task pane), minified; source maps only in
 *                  development builds (a production build ships none)
 *   taskpane.html  from src/taskpane/pane.html, loading office.js from Microsoft's CDN first
 *   taskpane.css   src/taskpane/pane.css (the page's Content-Security-Policy allows no inline style)
 *   functions.json generated from the registry (src/functions/metadata.ts), each function's helpUrl
 *                  on the same host as the manifest (SUNPANE_HOST)
 *   help/          the function help: one page per function, an index and a stylesheet, generated
 *                  from the registry (scripts/helpPages.ts); HTML and CSS only, no JavaScript
 *   manifest.xml   production: the production Id and display name, host replaced by SUNPANE_HOST
 *                  (default https://localhost:3000); development: manifest.xml's own identity
 *   assets/        icons
 * A production build fails when the JavaScript (excluding office.js) exceeds the size budget.
 * `webpack serve` (npm run dev-server / npm start) serves the same over HTTPS on port 3000.
 */
const fs = require('node:fs');
const path = require('node:path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const { resolveHost, manifestForHost, manifestForIdentity } = require('./scripts/manifest-host');

const ROOT = __dirname;
const SRC = path.join(ROOT, 'src');
const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';
/**
 * Functions + pane JavaScript, minified, excluding office.js [bytes]: 150 KB until the core gained
 * glazing types, conduction, the load by part and the clock (156.3 KB then); 165 KB until the pane
 * took on the command line's weather reader and checks (src/io/weather.ts and its helpers: 159.4 ->
 * 177.3 KB); 180 KB until devices cut the diffuse light too (the view-factor integration 5.9 KB,
 * the diffuse wiring and the new step texts 5.3 KB: 177.3 -> 188.4 KB); 190 KB until the pane took
 * the Office look (Fluent token values for the light and dark themes, the footer layout, keyboard
 * and dialog focus handling, the sun-path key, messages in the user's words: 188.4 -> 194.2 KB); 198 KB until the window range: its reader and
 * messages, the glossary's labels and older names and seven window functions beside the released
 * positional ones, and the sun-position fast path for ranges (194.2 -> 223.6 KB); 225 KB until
 * windows could share their site's sun and weather (src/core/gain/sharedYear.ts, the summary-only
 * year, the Perez kernel in two halves: 223.6 -> 226.7 KB); 229 KB until the pane under faults (a
 * half-written sheet removed when Excel refuses a request, small tables in blocks, the title check of
 * a remembered sheet: 228.1 -> 230.0 KB); 231 KB until the room behind a window (its checks, the
 * illustrative series reached from the window reader), the cooling load and conduction by part in
 * the year and peak functions, the table's and schedule's load columns and the pane's room box and
 * load column (230.0 -> 237.0 KB); 238 KB until the pane's schedule and options comparison showed
 * the cooling load (their load columns, the second bar chart, the sheet lines and on-screen words
 * about the peak load or its absence: 237.0 -> 240.3 KB); 241 KB until the hourly passes handed
 * their hours to the shading and the plane irradiance in one call each (row-wise kernels, the
 * one-hour calls as one-row runs of them) and schedule summaries were added up in the gain pass:
 * 240.3 -> 243.4 KB; 244 KB until the workbook's clock (the clock argument of every function
 * taking a date-time, the 1904 date system, the pane's date-system check: 243.4 -> 251.8 KB); 252 KB
 * until irradiance no sky can give was refused (the physically possible checks at every entry, the
 * clear-sky pair trial and their messages: 251.8 -> 254.8 KB); 256 KB until the pane's
 * daylight-saving boxes (stamps on the clock, the rule in words), its year sheet's peaks and month ×
 * hour means over the hours with weather and its schedule's headers by time convention: 254.8 ->
 * 257.1 KB.
 */
const BUDGET_BYTES = 260 * 1024;
const DEV_PORT = 3000;

/**
 * The registry's words — `summary`, `description`, `examples`, `outsideCheck` — are documentation:
 * the function reference (docs/functions.md) and functions.json are made from them in Node, and the
 * add-in's own code never reads them (messages are built from names, units and ranges). This
 * TypeScript transformer drops those properties from object literals in src/registry files, so the
 * bundle carries only what runs.
 */
const DOC_PROPERTIES = new Set(['summary', 'description', 'examples', 'outsideCheck']);
function dropRegistryExamples(context) {
  const ts = require('typescript');
  const registryDir = path.join(SRC, 'registry') + path.sep;
  return (sourceFile) => {
    if (!path.resolve(sourceFile.fileName).startsWith(registryDir)) return sourceFile;
    const visit = (node) => {
      if (ts.isObjectLiteralExpression(node)) {
        const kept = node.properties.filter((p) => !(ts.isPropertyAssignment(p) && ts.isIdentifier(p.name) && DOC_PROPERTIES.has(p.name.text)));
        const updated = ts.factory.updateObjectLiteralExpression(node, kept);
        return ts.visitEachChild(updated, visit, context);
      }
      return ts.visitEachChild(node, visit, context);
    };
    return ts.visitNode(sourceFile, visit);
  };
}

/**
 * Loads the TypeScript registry in this Node process (fresh on every compilation, for watch mode)
 * and makes functions.json (each function's helpUrl on `host`) and the help pages from it.
 */
function loadRegistryFiles(host) {
  require('ts-node').register({ transpileOnly: true, compilerOptions: { module: 'commonjs' } });
  const scripts = path.join(ROOT, 'scripts') + path.sep;
  for (const id of Object.keys(require.cache)) if (id.startsWith(SRC + path.sep) || id.startsWith(scripts)) delete require.cache[id];
  const { FUNCTIONS } = require('./src/registry/index.ts');
  const { functionsMetadata } = require('./src/functions/metadata.ts');
  const { helpFiles } = require('./scripts/helpPages.ts');
  return { metadata: functionsMetadata(FUNCTIONS, host), help: helpFiles(FUNCTIONS) };
}

/** Emits functions.json, the help pages and manifest.xml, and checks the bundle size. */
class SunpaneAddinPlugin {
  constructor(options) {
    this.options = options;
  }

  apply(compiler) {
    const { sources, Compilation } = compiler.webpack;
    compiler.hooks.thisCompilation.tap('SunpaneAddinPlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'SunpaneAddinPlugin', stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL }, () => {
        try {
          const { metadata, help } = loadRegistryFiles(resolveHost(process.env.SUNPANE_HOST));
          compilation.emitAsset('functions.json', new sources.RawSource(`${JSON.stringify(metadata, null, 2)}\n`));
          for (const [name, content] of help) compilation.emitAsset(name, new sources.RawSource(content), { minimized: true });
        } catch (err) {
          compilation.errors.push(new compiler.webpack.WebpackError(`functions.json and help pages: ${err && err.stack ? err.stack : err}`));
        }
        try {
          const manifestPath = path.join(ROOT, 'manifest.xml');
          compilation.fileDependencies.add(manifestPath);
          const identity = this.options.production ? 'production' : 'development';
          const xml = manifestForHost(manifestForIdentity(fs.readFileSync(manifestPath, 'utf8'), identity), resolveHost(process.env.SUNPANE_HOST));
          compilation.emitAsset('manifest.xml', new sources.RawSource(xml));
        } catch (err) {
          compilation.errors.push(new compiler.webpack.WebpackError(`manifest.xml: ${err && err.message ? err.message : err}`));
        }
      });
      // office.js from Microsoft's CDN, as a blocking script ahead of the (deferred) bundle.
      HtmlWebpackPlugin.getHooks(compilation).alterAssetTagGroups.tap('SunpaneAddinPlugin', (data) => {
        const already = [...data.headTags, ...data.bodyTags].some((t) => t.attributes && t.attributes.src === OFFICE_JS);
        if (!already) data.headTags.unshift(HtmlWebpackPlugin.createHtmlTagObject('script', { src: OFFICE_JS }));
        return data;
      });
    });
    compiler.hooks.afterEmit.tap('SunpaneAddinPlugin', (compilation) => {
      const scripts = Object.keys(compilation.assets).filter((name) => name.endsWith('.js')).sort();
      let total = 0;
      const lines = scripts.map((name) => {
        const bytes = compilation.assets[name].size();
        total += bytes;
        return `  ${name.padEnd(24)} ${(bytes / 1024).toFixed(1).padStart(8)} KB`;
      });
      const budget = this.options.budget;
      const verdict = budget ? ` (budget ${(BUDGET_BYTES / 1024).toFixed(0)} KB, minified, office.js excluded)` : ' (development build, not minified: no budget)';
      console.log(`Sunpane bundle sizes:\n${lines.join('\n')}\n  ${'total JavaScript'.padEnd(24)} ${(total / 1024).toFixed(1).padStart(8)} KB${verdict}`);
      if (budget && total > BUDGET_BYTES) {
        compilation.errors.push(new compiler.webpack.WebpackError(`bundle size budget exceeded: ${(total / 1024).toFixed(1)} KB of JavaScript > ${BUDGET_BYTES / 1024} KB`));
      }
    });
    // The size check runs after emit; make its error fail the run (and the process exit code).
    compiler.hooks.done.tap('SunpaneAddinPlugin', (stats) => {
      if (this.options.budget && stats.hasErrors()) process.exitCode = 1;
    });
  }
}

/**
 * The dev server's HTTPS settings: on Windows and macOS the Office development certificate (trusted
 * by desktop Excel) when it can be had; otherwise webpack-dev-server's own self-signed certificate,
 * which the browser must accept once (Linux, CI: see docs/platform.md#developing-on-linux — the trusted-store install needs sudo).
 */
async function devServerHttps() {
  if (process.platform !== 'win32' && process.platform !== 'darwin') return 'https';
  try {
    const devCerts = require('office-addin-dev-certs');
    return { type: 'https', options: await devCerts.getHttpsServerOptions() };
  } catch (err) {
    console.warn(`Office development certificate unavailable (${err && err.message ? err.message : err}); using a self-signed certificate.`);
    return 'https';
  }
}

module.exports = async (_env, argv) => {
  const production = argv.mode !== 'development';
  const serving = process.argv.some((a) => a === 'serve');
  return {
    mode: production ? 'production' : 'development',
    context: ROOT,
    entry: { taskpane: path.join(SRC, 'addin.ts') },
    output: { path: path.join(ROOT, 'dist'), filename: '[name].js', clean: true },
    devtool: production ? false : 'source-map',
    target: ['web', 'es2020'],
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          include: SRC,
          use: {
            loader: 'ts-loader',
            options: {
              configFile: path.join(ROOT, 'tsconfig.json'),
              transpileOnly: true,
              onlyCompileBundledFiles: true,
              compilerOptions: { module: 'es2020', sourceMap: !production },
              getCustomTransformers: () => ({ before: [dropRegistryExamples] }),
            },
          },
        },
      ],
    },
    performance: { hints: false },
    plugins: [
      new HtmlWebpackPlugin({ template: path.join(SRC, 'taskpane', 'pane.html'), filename: 'taskpane.html', chunks: ['taskpane'], scriptLoading: 'defer', minify: false }),
      new CopyWebpackPlugin({
        patterns: [
          // Copied as written (not minified): the help page's CSP names its inline style by hash.
          { from: path.join(ROOT, 'assets'), to: 'assets', globOptions: { ignore: ['**/*.md'] }, info: { minimized: true } },
          { from: path.join(SRC, 'taskpane', 'pane.css'), to: 'taskpane.css', info: { minimized: true } },
        ],
      }),
      new SunpaneAddinPlugin({ budget: production, production }),
    ],
    devServer: {
      port: DEV_PORT,
      server: serving ? await devServerHttps() : 'https',
      headers: { 'Access-Control-Allow-Origin': '*' },
      hot: false,
      liveReload: true,
      client: { overlay: false },
      static: false,
    },
  };
};
