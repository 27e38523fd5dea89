/**
 * manifest.xml, checked offline (the online validator is unreachable here, and
 * `office-addin-manifest info` passes dangling resids — docs/platform.md#developing-on-linux): the shared runtime's four
 * references on one resid, every resid defined and at most 32 characters, HTTPS everywhere, a
 * four-part version in step with package.json, the icons present at the sizes named, and the
 * build's host substitution (SUNPANE_HOST).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { NAMESPACE } from '../src/registry';
import { type XmlElement, allElements, at, childrenNamed, localName, parseXml } from './manifest-xml';
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the build's own CommonJS helper
const { DEV_HOST, IDENTITIES, resolveHost, manifestForHost, manifestForIdentity } = require('../scripts/manifest-host.js') as {
  DEV_HOST: string;
  IDENTITIES: Record<'development' | 'production', { id: string; displayName: string }>;
  resolveHost: (v: string | undefined) => string;
  manifestForHost: (xml: string, host: string) => string;
  manifestForIdentity: (xml: string, kind: string) => string;
};

const ROOT = path.resolve(__dirname, '..');
const TEMPLATE = fs.readFileSync(path.join(ROOT, 'manifest.xml'), 'utf8');
const PACKAGE_VERSION = (JSON.parse(fs.readFileSync(path.join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;

const xsiType = (el: XmlElement): string | undefined => el.attributes['xsi:type'];

function resources(root: XmlElement): Map<string, { kind: string; value: string }> {
  const res = at(root, 'VersionOverrides', 'Resources');
  const out = new Map<string, { kind: string; value: string }>();
  for (const group of res.children) {
    for (const item of group.children) {
      const id = item.attributes.id;
      if (out.has(id)) throw new Error(`resource id ${id} defined twice`);
      out.set(id, { kind: localName(group), value: item.attributes.DefaultValue });
    }
  }
  return out;
}

/** Width and height from a PNG's IHDR chunk. */
function pngSize(file: string): [number, number] {
  const b = fs.readFileSync(file);
  if (b.readUInt32BE(0) !== 0x89504e47 || b.toString('ascii', 12, 16) !== 'IHDR') throw new Error(`${file} is not a PNG`);
  return [b.readUInt32BE(16), b.readUInt32BE(20)];
}

function checkManifest(xml: string, host: string): void {
  const root = parseXml(xml);
  const res = resources(root);
  const elements = allElements(root);
  const urlOf = (resid: string): string => {
    const r = res.get(resid);
    if (!r || r.kind !== 'Urls') throw new Error(`resid ${resid} is not a defined URL`);
    return r.value;
  };

  // Every resid referenced is defined and short enough.
  for (const el of elements) {
    const resid = el.attributes.resid;
    if (resid === undefined) continue;
    expect({ resid, defined: res.has(resid) }).toEqual({ resid, defined: true });
    expect(resid.length).toBeLessThanOrEqual(32);
  }
  for (const id of res.keys()) expect(id.length).toBeLessThanOrEqual(32);

  // The shared runtime: one resid for Runtime, CustomFunctions Page, FunctionFile, ShowTaskpane.
  const host0 = at(root, 'VersionOverrides', 'Hosts').children.find((h) => xsiType(h) === 'Workbook')!;
  const runtime = at(host0, 'Runtimes', 'Runtime');
  expect(runtime.attributes.lifetime).toBe('long');
  const cf = childrenNamed(at(host0, 'AllFormFactors'), 'ExtensionPoint').find((e) => xsiType(e) === 'CustomFunctions')!;
  const page = at(cf, 'Page', 'SourceLocation').attributes.resid;
  const functionFile = at(host0, 'DesktopFormFactor', 'FunctionFile').attributes.resid;
  const showTaskpane = elements.filter((e) => localName(e) === 'Action' && xsiType(e) === 'ShowTaskpane');
  expect(showTaskpane.length).toBeGreaterThan(0);
  const shared = [runtime.attributes.resid, page, functionFile, ...showTaskpane.map((a) => at(a, 'SourceLocation').attributes.resid)];
  expect(new Set(shared)).toEqual(new Set([runtime.attributes.resid]));
  expect(urlOf(runtime.attributes.resid)).toBe(`${host}/taskpane.html`);
  expect(urlOf(at(cf, 'Script', 'SourceLocation').attributes.resid)).toBe(`${host}/taskpane.js`);
  expect(urlOf(at(cf, 'Metadata', 'SourceLocation').attributes.resid)).toBe(`${host}/functions.json`);
  expect(res.get(at(cf, 'Namespace').attributes.resid)?.value).toBe(NAMESPACE);

  // Requirements, permissions, identity.
  const sets = childrenNamed(at(root, 'Requirements', 'Sets'), 'Set').map((s) => `${s.attributes.Name} ${s.attributes.MinVersion}`);
  expect(sets).toContain('SharedRuntime 1.1');
  // Custom functions in a shared runtime need their own requirement set too; 1.3 for per-cell errors.
  expect(sets).toContain('CustomFunctionsRuntime 1.3');
  expect(at(root, 'Permissions').text).toBe('ReadWriteDocument');
  expect(at(root, 'Id').text).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
  expect(at(root, 'Version').text).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
  expect(at(root, 'Version').text.split('.').slice(0, 3).join('.')).toBe(PACKAGE_VERSION);
  expect(at(root, 'SupportUrl').attributes.DefaultValue.startsWith(`${host}/`)).toBe(true);

  // HTTPS everywhere; every URL on the add-in's own host except office.js is not in the manifest.
  const urls = [
    ...elements.map((e) => e.attributes.DefaultValue).filter((v): v is string => v !== undefined && /^[a-z]+:\/\//i.test(v)),
    ...elements.filter((e) => localName(e) === 'AppDomain').map((e) => e.text),
  ];
  expect(urls.length).toBeGreaterThan(8);
  for (const u of urls) expect(u.startsWith(`${host}/`) || u === host).toBe(true);
  for (const u of urls) expect(new URL(u).protocol).toBe('https:');

  // String limits of the XML manifest schema.
  for (const [id, r] of res) {
    if (r.kind === 'ShortStrings') expect({ id, length: r.value.length <= 125 }).toEqual({ id, length: true });
    if (r.kind === 'LongStrings') expect({ id, length: r.value.length <= 250 }).toEqual({ id, length: true });
  }

  // Icons: each reference names a size; the file behind it has exactly that size.
  const iconRefs: [string, number][] = elements
    .filter((e) => e.name === 'bt:Image' && e.attributes.resid !== undefined)
    .map((e) => [res.get(e.attributes.resid)!.value, Number(e.attributes.size)]);
  iconRefs.push([at(root, 'IconUrl').attributes.DefaultValue, 32], [at(root, 'HighResolutionIconUrl').attributes.DefaultValue, 64]);
  for (const [url, size] of iconRefs) {
    const file = path.join(ROOT, url.slice(host.length));
    expect(fs.existsSync(file)).toBe(true);
    expect({ url, size: pngSize(file) }).toEqual({ url, size: [size, size] });
  }
  expect(new Set(iconRefs.map(([, s]) => s))).toEqual(new Set([16, 32, 64, 80]));
}

describe('manifest.xml', () => {
  test('parses as XML with an OfficeApp task-pane root', () => {
    const root = parseXml(TEMPLATE);
    expect(root.name).toBe('OfficeApp');
    expect(xsiType(root)).toBe('TaskPaneApp');
  });

  test('is a valid shared-runtime manifest on the development host', () => {
    checkManifest(TEMPLATE, DEV_HOST);
  });

  test('opens the pane from a ribbon button with our own labels', () => {
    const root = parseXml(TEMPLATE);
    const res = resources(root);
    const button = allElements(root).find((e) => localName(e) === 'Control' && xsiType(e) === 'Button')!;
    expect(res.get(at(button, 'Label').attributes.resid)?.value).toBe('Window gain');
    expect(res.get(at(button.parent!, 'Label').attributes.resid)?.value).toBe('Sunpane');
  });

  test('the checks catch a broken manifest (a dangling resid, a split shared runtime, plain http)', () => {
    expect(() => checkManifest(TEMPLATE.replace('<FunctionFile resid="Sunpane.Runtime.Url"/>', '<FunctionFile resid="Sunpane.Nowhere"/>'), DEV_HOST)).toThrow();
    const split = TEMPLATE.replace('<FunctionFile resid="Sunpane.Runtime.Url"/>', '<FunctionFile resid="Sunpane.Script.Url"/>');
    expect(() => checkManifest(split, DEV_HOST)).toThrow();
    expect(() => checkManifest(manifestForHost(TEMPLATE, 'http://localhost:3000'), 'http://localhost:3000')).toThrow();
    expect(() => parseXml('<a><b></a>')).toThrow(/does not match/);
  });
});

describe('the manifest the build writes', () => {
  test('SUNPANE_HOST replaces the development host everywhere', () => {
    const host = resolveHost('https://addins.example.org/sunpane/');
    expect(host).toBe('https://addins.example.org/sunpane');
    const xml = manifestForHost(TEMPLATE, host);
    expect(xml).not.toContain(DEV_HOST);
    const root = parseXml(xml);
    const urls = allElements(root).map((e) => e.attributes.DefaultValue).filter((v) => v?.startsWith('https://'));
    for (const u of urls) expect(u!.startsWith('https://addins.example.org/sunpane/')).toBe(true);
  });

  test('a host that is not https is refused naming SUNPANE_HOST', () => {
    expect(() => resolveHost('http://example.org')).toThrow(/^SUNPANE_HOST = "http:\/\/example.org" is not allowed/);
    expect(() => resolveHost('example.org')).toThrow(/^SUNPANE_HOST/);
    expect(resolveHost(undefined)).toBe(DEV_HOST);
    expect(resolveHost('  ')).toBe(DEV_HOST);
  });

  test('dist/manifest.xml (from the production build) is the template with the production identity on one https host', () => {
    const built = path.join(ROOT, 'dist', 'manifest.xml');
    if (!fs.existsSync(built)) throw new Error('dist/manifest.xml is missing: run `npm run build` (npm test does it in pretest)');
    const xml = fs.readFileSync(built, 'utf8');
    const host = /<AppDomain>([^<]+)<\/AppDomain>/.exec(xml)?.[1] ?? '';
    expect(xml).toBe(manifestForHost(manifestForIdentity(TEMPLATE, 'production'), resolveHost(host)));
    checkManifest(xml, resolveHost(host));
  });

  test('development and production manifests differ in Id and display name, so both can be installed side by side', () => {
    const dev = parseXml(TEMPLATE);
    const prod = parseXml(manifestForIdentity(TEMPLATE, 'production'));
    expect(at(dev, 'Id').text).toBe(IDENTITIES.development.id);
    expect(at(dev, 'DisplayName').attributes.DefaultValue).toBe(IDENTITIES.development.displayName);
    expect(at(prod, 'Id').text).toBe(IDENTITIES.production.id);
    expect(at(prod, 'DisplayName').attributes.DefaultValue).toBe(IDENTITIES.production.displayName);
    expect(at(prod, 'Id').text).not.toBe(at(dev, 'Id').text);
    expect(at(prod, 'DisplayName').attributes.DefaultValue).not.toBe(at(dev, 'DisplayName').attributes.DefaultValue);
    expect(at(prod, 'Id').text.toLowerCase()).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
    // Nothing else changes between the two.
    expect(manifestForIdentity(TEMPLATE, 'production').split('\n').filter((l, i) => l !== TEMPLATE.split('\n')[i])).toHaveLength(2);
    expect(() => manifestForIdentity(TEMPLATE, 'staging')).toThrow(/staging/);
  });
});
