/* eslint-disable @typescript-eslint/no-this-alias -- plain browser script injected in place of office.js; its proxies hand "self" to callbacks. */
/*
 * A fake Excel host for tests: the subset of the Office JS / Excel JS API that the Sunpane task pane
 * uses, over an in-memory workbook. Written by us from the API's documented behaviour (no Office
 * code): operations are queued on a request context and applied, in order, at context.sync();
 * properties read back only after load() + sync(); getItemOrNullObject gives isNullObject after
 * sync. It records every queued call and every sync, and it enforces:
 *   - the 5 MB limit of one request (Excel on the web), measured as the JSON of the queued calls;
 *   - sheet-name rules (≤ 31 characters, none of : \ / ? * [ ], not blank, no apostrophe at either
 *     end, unique regardless of case);
 *   - value arrays of exactly the range's shape, with no NaN or Infinity;
 *   - table names unique, no blanks, and tables that do not overlap.
 * A test may set state.failOp = { op: 'tables.add', after: 0, code } to make the request holding the
 * (after + 1)-th such operation fail there, with the operations before it applied (as Excel does).
 * state.requestLimitBytes may be lowered to try a writer's blocks against a smaller limit.
 *
 * Use in the browser: serve this file as office.js; it defines window.Office, window.Excel and
 * window.__excelHost (state and helpers for the test). Use in node: require it and call
 * createExcelHost() for { Excel, Office, host } without touching globals.
 * Options may be preset in the page as window.__excelHostOptions = { settings: {...}, syncDelayMs, theme, dateSystem }
 * (theme: the Office theme colours, e.g. { bodyBackgroundColor: '#262626', bodyForegroundColor: '#FFFFFF' };
 * dateSystem: 1904 for a workbook in the 1904 date system, which workbook.functions.date answers in).
 */
(function (root) {
  'use strict';

  var REQUEST_LIMIT_BYTES = 5 * 1024 * 1024;
  var FORBIDDEN = /[:\\/?*[\]]/;

  function HostError(code, message) {
    var e = new Error(code + ': ' + message);
    e.name = 'RichApi.Error';
    e.code = code;
    return e;
  }

  function colIndex(letters) {
    var n = 0;
    for (var i = 0; i < letters.length; i++) n = n * 26 + (letters.charCodeAt(i) - 64);
    return n - 1;
  }
  function colLetters(index) {
    var n = index + 1;
    var s = '';
    while (n > 0) {
      var r = (n - 1) % 26;
      s = String.fromCharCode(65 + r) + s;
      n = Math.floor((n - 1) / 26);
    }
    return s;
  }
  function parseA1(address) {
    var m = /^\$?([A-Z]{1,3})\$?(\d+)(?::\$?([A-Z]{1,3})\$?(\d+))?$/.exec(String(address).toUpperCase());
    if (!m) throw HostError('InvalidArgument', 'The address "' + address + '" is not a cell range this host understands');
    var r0 = Number(m[2]) - 1;
    var c0 = colIndex(m[1]);
    var r1 = m[4] ? Number(m[4]) - 1 : r0;
    var c1 = m[3] ? colIndex(m[3]) : c0;
    return { r0: Math.min(r0, r1), c0: Math.min(c0, c1), r1: Math.max(r0, r1), c1: Math.max(c0, c1) };
  }
  function a1(box) {
    var first = colLetters(box.c0) + (box.r0 + 1);
    if (box.r0 === box.r1 && box.c0 === box.c1) return first;
    return first + ':' + colLetters(box.c1) + (box.r1 + 1);
  }
  function overlaps(a, b) {
    return a.r0 <= b.r1 && b.r0 <= a.r1 && a.c0 <= b.c1 && b.c0 <= a.c1;
  }
  function splitSheet(address) {
    var s = String(address);
    var i = s.lastIndexOf('!');
    if (i < 0) return { sheet: undefined, range: s };
    var sheet = s.slice(0, i);
    if (sheet.charAt(0) === "'") sheet = sheet.slice(1, -1).replace(/''/g, "'");
    return { sheet: sheet, range: s.slice(i + 1) };
  }

  /** True when a formula's parentheses and brackets pair up outside its string literals. */
  function balanced(f) {
    var depth = { '(': 0, '[': 0 };
    var quoted = false;
    for (var i = 0; i < f.length; i++) {
      var ch = f.charAt(i);
      if (ch === '"') quoted = !quoted;
      else if (quoted) continue;
      else if (ch === "'" && (f.charAt(i + 1) === '[' || f.charAt(i + 1) === ']' || f.charAt(i + 1) === '#' || f.charAt(i + 1) === "'")) i++;
      else if (ch === '(' || ch === '[') depth[ch]++;
      else if (ch === ')') depth['(']--;
      else if (ch === ']') depth['[']--;
      if (depth['('] < 0 || depth['['] < 0) return false;
    }
    return !quoted && depth['('] === 0 && depth['['] === 0;
  }

  function createExcelHost(options) {
    options = options || {};
    var state = {
      sheets: [],
      tables: [],
      calls: [],
      syncs: [],
      active: undefined,
      documentSettings: JSON.parse(JSON.stringify(options.settings || {})),
      savedSettings: JSON.parse(JSON.stringify(options.settings || {})),
      settingsSaves: 0,
      syncDelayMs: options.syncDelayMs || 0,
      requestLimitBytes: options.requestLimitBytes || REQUEST_LIMIT_BYTES,
      runs: 0,
      dateSystem: options.dateSystem === 1904 ? 1904 : 1900,
    };
    /** DATE(y, m, d) as the workbook counts it: days since 30 December 1899 (from 1 March 1900 on), less 1462 in the 1904 system. */
    function excelDate(y, m, d) {
      var serial = (Date.UTC(y, m - 1, d) - Date.UTC(1899, 11, 30)) / 86400000;
      return state.dateSystem === 1904 ? serial - 1462 : serial;
    }

    function findSheet(name) {
      if (name === undefined) return state.sheets.find(function (s) { return s.name === state.active; });
      var lower = String(name).toLowerCase();
      return state.sheets.find(function (s) { return s.name.toLowerCase() === lower; });
    }
    function requireSheet(name) {
      var s = findSheet(name);
      if (!s) throw HostError('ItemNotFound', 'The sheet "' + name + '" does not exist');
      return s;
    }
    function checkSheetName(name) {
      if (typeof name !== 'string' || name.trim() === '' || name.length > 31 || FORBIDDEN.test(name) || name.charAt(0) === "'" || name.charAt(name.length - 1) === "'") {
        throw HostError('InvalidArgument', 'The sheet name "' + name + '" breaks Excel\'s rules');
      }
      if (findSheet(name)) throw HostError('ItemAlreadyExists', 'A sheet named "' + name + '" already exists');
    }
    function newSheet(name) {
      checkSheetName(name);
      var s = { name: name, cells: new Map(), formulaCells: new Set(), formats: new Map(), tables: [], charts: [], conditionalFormats: [], frozenRows: 0, styles: [] };
      state.sheets.push(s);
      if (!state.active) state.active = name;
      return s;
    }
    function cellKey(r, c) {
      return r + ',' + c;
    }
    function readBox(sheet, box) {
      var out = [];
      for (var r = box.r0; r <= box.r1; r++) {
        var row = [];
        for (var c = box.c0; c <= box.c1; c++) {
          var v = sheet.cells.get(cellKey(r, c));
          row.push(v === undefined ? '' : v);
        }
        out.push(row);
      }
      return out;
    }
    function checkShape(box, values, what) {
      var rows = box.r1 - box.r0 + 1;
      var cols = box.c1 - box.c0 + 1;
      if (!Array.isArray(values) || values.length !== rows || values.some(function (r) { return !Array.isArray(r) || r.length !== cols; })) {
        throw HostError('InvalidArgument', 'The ' + what + ' array does not match the size of the range ' + a1(box) + ' (' + rows + ' × ' + cols + ')');
      }
    }

    // ---- the request context -------------------------------------------------------------
    function Context() {
      this._queue = [];
      this.workbook = new Workbook(this);
      this.application = {
        suspendApiCalculationUntilNextSync: queueFn(this, 'application', 'suspendApiCalculationUntilNextSync', [], function () {}),
        suspendScreenUpdatingUntilNextSync: queueFn(this, 'application', 'suspendScreenUpdatingUntilNextSync', [], function () {}),
      };
      this.trackedObjects = { add: function () {}, remove: function () {} };
    }
    Context.prototype.sync = function () {
      var queue = this._queue;
      this._queue = [];
      var payload = JSON.stringify(queue.map(function (q) { return { op: q.op, target: q.target, args: q.args }; }));
      var bytes = payload.length;
      var syncRecord = {
        bytes: bytes,
        ops: queue.length,
        names: queue.map(function (q) { return q.op; }),
        valueRows: queue.filter(function (q) { return q.op === 'range.values'; }).map(function (q) { return Array.isArray(q.args[0]) ? q.args[0].length : 1; }),
      };
      state.syncs.push(syncRecord);
      var delay = state.syncDelayMs;
      return new Promise(function (resolve, reject) {
        setTimeout(function () {
          if (bytes > state.requestLimitBytes) {
            syncRecord.refused = true;
            reject(HostError('RequestPayloadSizeLimitExceeded', 'The request payload size (' + bytes + ' bytes) has exceeded the limit'));
            return;
          }
          try {
            for (var i = 0; i < queue.length; i++) {
              // A fault set by a test: the request stops at the chosen operation, as Excel stops a
              // batch at a failing command (those before it stay applied).
              var f = state.failOp;
              if (f && queue[i].op === f.op && (f.seen = (f.seen || 0) + 1) > (f.after || 0)) {
                state.failOp = undefined;
                syncRecord.failed = f.op;
                throw HostError(f.code || 'GeneralException', 'The request failed at ' + f.op + ' (a fault set by the test)');
              }
              queue[i].apply();
            }
            resolve();
          } catch (e) {
            reject(e);
          }
        }, delay);
      });
    };
    function record(ctx, target, op, args, apply) {
      var entry = { op: op, target: target, args: args, apply: apply };
      ctx._queue.push(entry);
      state.calls.push({ op: op, target: target, args: summarise(args) });
    }
    function summarise(args) {
      var text = JSON.stringify(args);
      return text && text.length > 300 ? text.slice(0, 300) + '…' : text;
    }
    function queueFn(ctx, target, op, _args, apply) {
      return function () {
        var args = Array.prototype.slice.call(arguments);
        record(ctx, target, op, args, function () { apply.apply(null, args); });
      };
    }
    function loadable(obj, ctx, target, snapshot) {
      obj._loaded = null;
      obj.load = function (props) {
        record(ctx, target(), 'load', [props], function () { obj._loaded = snapshot(); });
        return obj;
      };
    }
    function loadedGetter(obj, prop) {
      Object.defineProperty(obj, prop, {
        get: function () {
          if (!obj._loaded || !(prop in obj._loaded)) throw HostError('PropertyNotLoaded', 'The property "' + prop + '" is not available: call load() and sync() first');
          return obj._loaded[prop];
        },
        configurable: true,
      });
    }

    // ---- workbook ----------------------------------------------------------------------
    function Workbook(ctx) {
      this.worksheets = new Worksheets(ctx);
      this.tables = new Tables(ctx, undefined);
      var wb = this;
      this.getSelectedRange = function () {
        return new Range(ctx, function () { return requireSheet(undefined); }, 'A1');
      };
      this.settings = {
        add: queueFn(ctx, 'workbook.settings', 'settings.add', [], function (key, value) { state.documentSettings[key] = value; state.savedSettings[key] = value; }),
      };
      // Worksheet functions (ExcelApi 1.2): DATE only, its value read after load('value') + sync().
      this.functions = {
        date: function (y, m, d) {
          var result = {};
          loadable(result, ctx, function () { return 'functions.date'; }, function () { return { value: excelDate(y, m, d) }; });
          loadedGetter(result, 'value');
          return result;
        },
      };
      void wb;
    }

    function Worksheets(ctx) {
      var items = this;
      this.add = function (name) {
        var proxy = new Worksheet(ctx, function () { return requireSheet(name); }, name);
        record(ctx, 'worksheets', 'worksheets.add', [name], function () { newSheet(name); });
        return proxy;
      };
      this.getItem = function (name) {
        var proxy = new Worksheet(ctx, function () { return requireSheet(name); }, name);
        record(ctx, 'worksheets', 'worksheets.getItem', [name], function () { requireSheet(name); });
        return proxy;
      };
      this.getItemOrNullObject = function (name) {
        var proxy = new Worksheet(ctx, function () { return requireSheet(name); }, name);
        proxy._isNull = undefined;
        Object.defineProperty(proxy, 'isNullObject', {
          get: function () {
            if (proxy._isNull === undefined) throw HostError('PropertyNotLoaded', 'isNullObject is known only after sync()');
            return proxy._isNull;
          },
        });
        record(ctx, 'worksheets', 'worksheets.getItemOrNullObject', [name], function () { proxy._isNull = !findSheet(name); });
        return proxy;
      };
      this.getActiveWorksheet = function () {
        return new Worksheet(ctx, function () { return requireSheet(undefined); }, undefined);
      };
      this.load = function (props) {
        record(ctx, 'worksheets', 'load', [props], function () {
          items.items = state.sheets.map(function (s) {
            var w = new Worksheet(ctx, function () { return requireSheet(s.name); }, s.name);
            w._loaded = { name: s.name };
            return w;
          });
        });
        return items;
      };
    }

    function Worksheet(ctx, resolve, name) {
      var ws = this;
      var label = 'sheet ' + (name === undefined ? '(active)' : JSON.stringify(name));
      loadable(ws, ctx, function () { return label; }, function () { var s = resolve(); return { name: s.name, position: state.sheets.indexOf(s) }; });
      loadedGetter(ws, 'name');
      loadedGetter(ws, 'position');
      this.getRange = function (address) {
        return new Range(ctx, resolve, address || 'A1');
      };
      this.getRangeByIndexes = function (row, col, rows, cols) {
        return new Range(ctx, resolve, a1({ r0: row, c0: col, r1: row + rows - 1, c1: col + cols - 1 }));
      };
      this.tables = new Tables(ctx, resolve);
      this.charts = {
        add: function (type, source, seriesBy) {
          var chart = { type: type, source: source._address, seriesBy: seriesBy, title: undefined, position: undefined, legend: undefined, axisTitles: {} };
          record(ctx, label, 'charts.add', [type, source._address, seriesBy], function () {
            var s = resolve();
            source._box();
            s.charts.push(chart);
          });
          var proxy = {
            title: {},
            legend: {},
            axes: { valueAxis: { title: {} }, categoryAxis: { title: {} } },
            setPosition: function (start, end) {
              record(ctx, 'chart', 'chart.setPosition', [start, end], function () { chart.position = [start, end]; });
            },
          };
          Object.defineProperty(proxy.title, 'text', { set: function (v) { record(ctx, 'chart', 'chart.title', [v], function () { chart.title = v; }); } });
          Object.defineProperty(proxy.legend, 'position', { set: function (v) { record(ctx, 'chart', 'chart.legend', [v], function () { chart.legend = v; }); } });
          ['valueAxis', 'categoryAxis'].forEach(function (axis) {
            Object.defineProperty(proxy.axes[axis].title, 'text', { set: function (v) { record(ctx, 'chart', 'chart.axisTitle', [axis, v], function () { chart.axisTitles[axis] = v; }); } });
          });
          Object.defineProperty(proxy, 'name', { set: function (v) { record(ctx, 'chart', 'chart.name', [v], function () { chart.name = v; }); } });
          chart.seriesColours = [];
          proxy.series = {
            getItemAt: function (i) {
              return {
                format: {
                  fill: {
                    setSolidColor: function (colour) {
                      record(ctx, 'chart', 'series.fill.setSolidColor', [i, colour], function () { chart.seriesColours[i] = colour; });
                    },
                  },
                },
              };
            },
          };
          return proxy;
        },
      };
      this.freezePanes = {
        freezeRows: function (n) {
          record(ctx, label, 'freezePanes.freezeRows', [n], function () { resolve().frozenRows = n; });
        },
      };
      this.delete = function () {
        record(ctx, label, 'worksheet.delete', [], function () {
          var s = resolve();
          state.sheets.splice(state.sheets.indexOf(s), 1);
          state.tables = state.tables.filter(function (t) { return t.sheet !== s; });
          if (state.active === s.name) state.active = state.sheets.length ? state.sheets[0].name : undefined;
        });
      };
      this.activate = function () {
        record(ctx, label, 'worksheet.activate', [], function () { state.active = resolve().name; });
      };
      Object.defineProperty(ws, 'tabColor', { set: function (v) { record(ctx, label, 'worksheet.tabColor', [v], function () { resolve().tabColor = v; }); } });
    }

    function Tables(ctx, resolveSheet) {
      this.add = function (address, hasHeaders) {
        var parts = splitSheet(address);
        var table = { name: undefined, sheet: undefined, box: undefined, hasHeaders: hasHeaders, style: undefined };
        var proxy = new TableProxy(ctx, function () { return table; });
        record(ctx, 'tables', 'tables.add', [address, hasHeaders], function () {
          var s = parts.sheet !== undefined ? requireSheet(parts.sheet) : resolveSheet ? resolveSheet() : requireSheet(undefined);
          var box = parseA1(parts.range);
          state.tables.forEach(function (t) {
            if (t.sheet === s && overlaps(t.box, box)) throw HostError('InvalidOperation', 'A table cannot overlap another table');
          });
          table.sheet = s;
          table.box = box;
          table.name = 'Table' + (state.tables.length + 1);
          while (state.tables.some(function (t) { return t.name.toLowerCase() === table.name.toLowerCase(); })) table.name += 'x';
          state.tables.push(table);
          s.tables.push(table);
        });
        return proxy;
      };
      var collection = this;
      this.load = function (props) {
        record(ctx, 'tables', 'load', [props], function () {
          var sheet = resolveSheet ? resolveSheet() : undefined;
          collection.items = state.tables.filter(function (t) { return !sheet || t.sheet === sheet; }).map(function (t) { return { name: t.name }; });
        });
        return collection;
      };
      this.getItemOrNullObject = function (name) {
        var found;
        var proxy = new TableProxy(ctx, function () {
          if (!found) throw HostError('ItemNotFound', 'No table named "' + name + '"');
          return found;
        });
        proxy._isNull = undefined;
        Object.defineProperty(proxy, 'isNullObject', {
          get: function () {
            if (proxy._isNull === undefined) throw HostError('PropertyNotLoaded', 'isNullObject is known only after sync()');
            return proxy._isNull;
          },
        });
        record(ctx, 'tables', 'tables.getItemOrNullObject', [name], function () {
          var lower = String(name).toLowerCase();
          found = state.tables.find(function (t) { return t.name.toLowerCase() === lower && (!resolveSheet || t.sheet === resolveSheet()); });
          proxy._isNull = !found;
        });
        return proxy;
      };
    }

    function TableProxy(ctx, resolve) {
      var proxy = this;
      Object.defineProperty(proxy, 'name', {
        set: function (v) {
          record(ctx, 'table', 'table.name', [v], function () {
            if (!/^[A-Za-z_\\][A-Za-z0-9_.]*$/.test(v) || v.length > 255) throw HostError('InvalidArgument', 'The table name "' + v + '" is not allowed');
            var t = resolve();
            if (state.tables.some(function (o) { return o !== t && o.name.toLowerCase() === String(v).toLowerCase(); })) throw HostError('ItemAlreadyExists', 'A table named "' + v + '" already exists');
            t.name = v;
          });
        },
      });
      Object.defineProperty(proxy, 'style', { set: function (v) { record(ctx, 'table', 'table.style', [v], function () { resolve().style = v; }); } });
      function part(which) {
        return function () {
          return new Range(ctx, function () { return resolve().sheet; }, function () {
            var t = resolve();
            var b = t.box;
            if (which === 'header') return a1({ r0: b.r0, c0: b.c0, r1: b.r0, c1: b.c1 });
            if (which === 'body') return a1({ r0: b.r0 + (t.hasHeaders ? 1 : 0), c0: b.c0, r1: b.r1, c1: b.c1 });
            return a1(b);
          });
        };
      }
      this.getRange = part('all');
      this.getHeaderRowRange = part('header');
      this.getDataBodyRange = part('body');
    }

    function Range(ctx, resolveSheet, address) {
      var range = this;
      var addr = function () { return typeof address === 'function' ? address() : splitSheet(address).range; };
      var sheetOf = function () {
        var parts = typeof address === 'function' ? {} : splitSheet(address);
        return parts.sheet !== undefined ? requireSheet(parts.sheet) : resolveSheet();
      };
      range._address = typeof address === 'function' ? '(table part)' : address;
      range._box = function () { return parseA1(addr()); };
      var label = 'range ' + range._address;
      loadable(range, ctx, function () { return label; }, function () {
        var s = sheetOf();
        var box = parseA1(addr());
        return { values: readBox(s, box), address: s.name + '!' + a1(box), rowCount: box.r1 - box.r0 + 1, columnCount: box.c1 - box.c0 + 1 };
      });
      ['address', 'rowCount', 'columnCount'].forEach(function (p) { loadedGetter(range, p); });
      Object.defineProperty(range, 'values', {
        get: function () {
          if (!range._loaded) throw HostError('PropertyNotLoaded', 'values: call load("values") and sync() first');
          return range._loaded.values;
        },
        set: function (values) {
          record(ctx, label, 'range.values', [values], function () {
            var s = sheetOf();
            var box = parseA1(addr());
            checkShape(box, values, 'values');
            for (var r = 0; r < values.length; r++) {
              for (var c = 0; c < values[r].length; c++) {
                var v = values[r][c];
                if (typeof v === 'number' && !isFinite(v)) throw HostError('InvalidArgument', 'A value is not a finite number at ' + a1({ r0: box.r0 + r, c0: box.c0 + c, r1: box.r0 + r, c1: box.c0 + c }));
                if (v !== null && v !== '' && typeof v !== 'number' && typeof v !== 'string' && typeof v !== 'boolean') throw HostError('InvalidArgument', 'A value of an unsupported type');
                var key = cellKey(box.r0 + r, box.c0 + c);
                // As Excel: a text starting with = + - @ is entered as a formula; a leading
                // apostrophe marks text and is not part of the value.
                s.formulaCells.delete(key);
                if (typeof v === 'string' && v.charAt(0) === "'") v = v.slice(1);
                else if (typeof v === 'string' && /^[=+\-@]/.test(v)) s.formulaCells.add(key);
                if (v === null || v === '') s.cells.delete(key);
                else s.cells.set(key, v);
              }
            }
          });
        },
      });
      // Formulas are kept as the text written (this stand-in does not calculate); plain values pass through.
      Object.defineProperty(range, 'formulas', {
        set: function (formulas) {
          record(ctx, label, 'range.formulas', [formulas], function () {
            var s = sheetOf();
            var box = parseA1(addr());
            checkShape(box, formulas, 'formulas');
            for (var r = 0; r < formulas.length; r++) {
              for (var c = 0; c < formulas[r].length; c++) {
                var f = formulas[r][c];
                if (typeof f === 'number' && !isFinite(f)) throw HostError('InvalidArgument', 'A formula array holds a number that is not finite');
                if (typeof f === 'string' && f.charAt(0) === '=' && !balanced(f)) throw HostError('InvalidArgument', 'The formula ' + f + ' has unbalanced brackets or quotes');
                var key = cellKey(box.r0 + r, box.c0 + c);
                if (f === null || f === '') s.cells.delete(key);
                else s.cells.set(key, f);
              }
            }
          });
        },
      });
      Object.defineProperty(range, 'numberFormat', {
        set: function (formats) {
          record(ctx, label, 'range.numberFormat', [formats], function () {
            var s = sheetOf();
            var box = parseA1(addr());
            checkShape(box, formats, 'numberFormat');
            for (var r = 0; r < formats.length; r++) for (var c = 0; c < formats[r].length; c++) s.formats.set(cellKey(box.r0 + r, box.c0 + c), formats[r][c]);
          });
        },
      });
      function styleSetter(obj, path) {
        Object.defineProperty(obj, path[path.length - 1], {
          set: function (v) {
            record(ctx, label, 'format.' + path.join('.'), [v], function () { sheetOf().styles.push({ address: a1(parseA1(addr())), what: path.join('.'), value: v }); });
          },
        });
      }
      range.format = { font: {}, fill: {} };
      styleSetter(range.format.font, ['font', 'bold']);
      styleSetter(range.format.font, ['font', 'color']);
      styleSetter(range.format.font, ['font', 'italic']);
      styleSetter(range.format.fill, ['fill', 'color']);
      styleSetter(range.format, ['columnWidth']);
      styleSetter(range.format, ['horizontalAlignment']);
      styleSetter(range.format, ['wrapText']);
      range.format.autofitColumns = function () {
        record(ctx, label, 'format.autofitColumns', [], function () { sheetOf(); });
      };
      range.conditionalFormats = {
        add: function (type) {
          var cf = { type: type, address: range._address, criteria: undefined };
          record(ctx, label, 'conditionalFormats.add', [type], function () {
            var s = sheetOf();
            cf.address = a1(parseA1(addr()));
            s.conditionalFormats.push(cf);
          });
          var proxy = { colorScale: {} };
          Object.defineProperty(proxy.colorScale, 'criteria', { set: function (v) { record(ctx, label, 'colorScale.criteria', [v], function () { cf.criteria = v; }); } });
          return proxy;
        },
      };
    }

    // ---- Office and Excel globals --------------------------------------------------------
    var Excel = {
      run: function (batch) {
        state.runs++;
        var ctx = new Context();
        return Promise.resolve()
          .then(function () { return batch(ctx); })
          .then(function (result) {
            if (ctx._queue.length === 0) return result;
            return ctx.sync().then(function () { return result; });
          });
      },
      RequestContext: Context,
    };
    var settingsApi = {
      get: function (key) { return Object.prototype.hasOwnProperty.call(state.documentSettings, key) ? state.documentSettings[key] : null; },
      set: function (key, value) { state.documentSettings[key] = JSON.parse(JSON.stringify(value)); },
      remove: function (key) { delete state.documentSettings[key]; },
      saveAsync: function (a, b) {
        var cb = typeof a === 'function' ? a : b;
        state.savedSettings = JSON.parse(JSON.stringify(state.documentSettings));
        state.settingsSaves++;
        setTimeout(function () { if (cb) cb({ status: 'succeeded' }); }, 0);
      },
    };
    var Office = {
      onReady: function (cb) {
        var info = { host: 'Excel', platform: 'OfficeOnline' };
        return new Promise(function (resolve) {
          setTimeout(function () {
            if (cb) cb(info);
            resolve(info);
          }, 0);
        });
      },
      HostType: { Excel: 'Excel' },
      AsyncResultStatus: { Succeeded: 'succeeded', Failed: 'failed' },
      context: {
        document: { settings: settingsApi },
        // The host's theme colours (Office.context.officeTheme); a test may give dark ones.
        officeTheme: options.theme || { bodyBackgroundColor: '#FFFFFF', bodyForegroundColor: '#000000', controlBackgroundColor: '#FFFFFF', controlForegroundColor: '#000000' },
        requirements: {
          isSetSupported: function (name, version) {
            if (name !== 'ExcelApi') return false;
            return Number(version || '1.1') <= 1.12;
          },
        },
      },
    };

    var host = {
      state: state,
      sheetNames: function () { return state.sheets.map(function (s) { return s.name; }); },
      sheet: function (name) { return findSheet(name); },
      /** Cell values of an A1 range on a sheet (blank cells as ''). */
      read: function (sheet, address) { return readBox(requireSheet(sheet), parseA1(address)); },
      /** A1 addresses of the cells a text value turned into a formula (as Excel reads "=…", "+…", "-…", "@…"). */
      formulaCells: function (sheet) {
        return Array.from(requireSheet(sheet).formulaCells).map(function (k) { var rc = k.split(',').map(Number); return a1({ r0: rc[0], c0: rc[1], r1: rc[0], c1: rc[1] }); });
      },
      formatAt: function (sheet, address) { return requireSheet(sheet).formats.get(cellKey(parseA1(address).r0, parseA1(address).c0)); },
      /** Adds a sheet of the user's with values from A1 (test set-up, outside any request). */
      addUserSheet: function (name, values, topLeft) {
        var s = newSheet(name);
        var start = parseA1(topLeft || 'A1');
        for (var r = 0; r < values.length; r++) for (var c = 0; c < values[r].length; c++) if (values[r][c] !== '' && values[r][c] !== null) s.cells.set(cellKey(start.r0 + r, start.c0 + c), values[r][c]);
        return name;
      },
      /** Makes a user table over a range of a sheet (test set-up). */
      addUserTable: function (sheetName, address, name) {
        var s = requireSheet(sheetName);
        var t = { name: name, sheet: s, box: parseA1(address), hasHeaders: true };
        state.tables.push(t);
        s.tables.push(t);
      },
      tables: function () {
        return state.tables.map(function (t) { return { name: t.name, sheet: t.sheet.name, address: a1(t.box), style: t.style }; });
      },
      charts: function (sheetName) { return requireSheet(sheetName).charts.slice(); },
      conditionalFormats: function (sheetName) { return requireSheet(sheetName).conditionalFormats.slice(); },
      /** The whole used area of a sheet as a map "r,c" → value (for snapshots). */
      snapshot: function (sheetName) {
        var s = requireSheet(sheetName);
        return JSON.stringify(Array.from(s.cells.entries()).sort());
      },
    };
    return { Excel: Excel, Office: Office, host: host };
  }

  if (typeof module !== 'undefined' && module.exports) {
    module.exports = { createExcelHost: createExcelHost, REQUEST_LIMIT_BYTES: REQUEST_LIMIT_BYTES };
  } else {
    var made = createExcelHost(root.__excelHostOptions);
    root.Excel = made.Excel;
    root.Office = made.Office;
    root.__excelHost = made.host;
    if (!root.CustomFunctions) {
      root.__associated = [];
      root.CustomFunctions = {
        associate: function (id, fn) { root.__associated.push(id); void fn; },
        Error: function (code, message) { this.code = code; this.message = message; },
        ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', divisionByZero: '#DIV/0!', invalidNumber: '#NUM!', nullReference: '#NULL!' },
      };
    }
  }
})(typeof window !== 'undefined' ? window : globalThis);
