/* Sublevel Atlas finder: one search box for every species, level, hyperfine
   level, sublevel, line and Zeeman component of the site. Classic script
   (module scripts do not load from file://). Data: the global
   AtlasSearchData from assets/search-index.js (src/site/searchIndex.ts);
   library: the global MiniSearch. Without JavaScript the box stays hidden.
   In node (tests), it only defines the global AtlasFinder. */
(function (root) {
  "use strict";

  // ---- Query normalization: a copy of src/site/searchNormalize.ts, tested to agree. ----
  var SCRIPT_DIGITS = {
    "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9",
    "₀": "0", "₁": "1", "₂": "2", "₃": "3", "₄": "4", "₅": "5", "₆": "6", "₇": "7", "₈": "8", "₉": "9",
    "⁺": "+", "₊": "+", "⁻": "-", "₋": "-", "\u2212": "-", "⁄": "/", "½": "1/2", "°": "o"
  };
  var TERM = /^(\d*)([spdfghiklmnoqrtuvwxyz])o?(\d+(?:\/2)?)$/;
  var ASSIGN = /^(mf|mj|mu|ml|m|f|j)=([+-]?)(\d+(?:\/2|\.5|\.0)?)$/;

  function halves(t) {
    if (t.slice(-2) === ".5") return (Number(t.slice(0, -2)) * 2 + 1) + "/2";
    if (t.slice(-2) === ".0") return t.slice(0, -2);
    return t;
  }

  function token(t) {
    var a = ASSIGN.exec(t);
    if (a) {
      var v = halves(a[3]);
      return a[1] + "=" + (a[2] === "-" && v !== "0" ? "-" : "") + v;
    }
    return t.split("-").map(function (part) {
      var m = TERM.exec(part);
      return m ? m[1] + m[2] + m[3] : part;
    }).join("-");
  }

  function searchTokens(text) {
    var folded = Array.from(text).map(function (ch) { return SCRIPT_DIGITS[ch] || ch; }).join("");
    return folded
      .replace(/[_{}^]/g, "")
      .toLowerCase()
      .replace(/(\d)[\u2009\u202f](?=\d)/g, "$1")
      .replace(/\s*=\s*/g, "=")
      .split(/[\s,;]+/)
      .filter(Boolean)
      .map(token);
  }
  // ---- end of the copy ----

  /** "3/2" → 3, "-1" → -2 (doubled quantum numbers, as in src/physics/quantum.ts). */
  function doubled(v) {
    var neg = v.charAt(0) === "-";
    if (neg) v = v.slice(1);
    var k = v.indexOf("/") >= 0 ? parseInt(v, 10) : 2 * parseInt(v, 10);
    return neg ? -k : k;
  }
  /** Same as formatDoubled in src/physics/quantum.ts (anchors are built with it). */
  function fd(k) { return k % 2 === 0 ? String(k / 2) : k + "/2"; }
  var MINUS = "\u2212";
  function shown(k) { return k > 0 ? "+" + fd(k) : k < 0 ? MINUS + fd(-k) : "0"; }
  function mValues(j2) { var out = []; for (var m = -j2; m <= j2; m += 2) out.push(m === 0 ? 0 : m); return out; }

  /** Query tokens split into search words and quantum-number constraints (doubled). */
  function parseQuery(text) {
    var words = [], qn = {}, any = false;
    searchTokens(text).forEach(function (t) {
      var a = /^(mf|mj|mu|ml|m|f|j)=(-?\d+(?:\/2)?)$/.exec(t);
      if (a) { qn[a[1]] = doubled(a[2]); any = true; } else words.push(t);
    });
    return { words: words, qn: qn, hasQn: any };
  }

  var SUP = { "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
  var SUB = { "0": "₀", "1": "₁", "2": "₂", "3": "₃", "4": "₄", "5": "₅", "6": "₆", "7": "₇", "8": "₈", "9": "₉" };
  function map(s, table) { return Array.from(s).map(function (c) { return table[c] || c; }).join(""); }
  /** "2Po3/2" → "²P°₃/₂" for result labels. */
  function termText(t) {
    var m = /^(\d+)([A-Za-z])([o°]?)(\d+(?:\/2)?)$/.exec(t);
    return m ? map(m[1], SUP) + m[2] + (m[3] ? "°" : "") + map(m[4], SUB) : t;
  }

  function keySet(s) { var o = {}; s.split(" ").forEach(function (k) { if (k) o[k] = true; }); return o; }

  /** A finder over the search data; `search(text, limit)` gives { rows, total }. */
  function createFinder(data, MiniSearch) {
    if (!data || data.v !== 1) throw new Error("search data of an unknown format");
    var docs = [];
    var speciesKeys = data.species.map(function (s) { return s[3]; });
    data.species.forEach(function (s, i) {
      docs.push({ kind: "species", i: i, name: s[3], term: "", species: s[3], num: "", rel: "" });
    });
    data.levels.forEach(function (l, i) {
      docs.push({ kind: "level", i: i, name: l[3], term: l[4], species: speciesKeys[l[0]], num: "", rel: "" });
    });
    data.lines.forEach(function (n, i) {
      var up = data.levels[n[2]], lo = data.levels[n[3]];
      var rel = [up, lo].map(function (l) { return l ? l[3] + " " + l[4] : ""; }).join(" ");
      docs.push({ kind: "line", i: i, name: n[6], term: "", species: speciesKeys[n[0]], num: n[4], rel: rel });
    });
    docs.forEach(function (d, k) {
      d.id = k;
      d.sets = { name: keySet(d.name), term: keySet(d.term), species: keySet(d.species), num: keySet(d.num) };
    });
    var ms = new MiniSearch({
      fields: ["name", "term", "species", "num", "rel"],
      storeFields: [],
      tokenize: function (s) { return s.split(" ").filter(Boolean); },
      processTerm: function (t) { return t; }
    });
    ms.addAll(docs);

    // Exact hits rank first: 2 when every word is an exact key and one names the entry itself, 1 when every word is exact.
    function tier(d, words) {
      var primary = false, covered = 0;
      words.forEach(function (w) {
        var own = d.sets.name[w] || d.sets.term[w];
        if (own) primary = true;
        if (own || d.sets.species[w] || d.sets.num[w]) covered++;
      });
      if (covered < words.length) return 0;
      return primary ? 2 : 1;
    }

    function entities(words) {
      if (!words.length) return docs.filter(function (d) { return d.kind !== "species"; });
      var hits = ms.search(words.join(" "), {
        prefix: true,
        combineWith: "AND",
        boost: { name: 4, term: 3, species: 1.5, num: 1, rel: 0.3 }
      });
      return hits
        .map(function (h, order) { var d = docs[h.id]; return { d: d, t: tier(d, words), s: h.score, o: order }; })
        .sort(function (a, b) { return b.t - a.t || b.s - a.s || a.o - b.o; })
        .map(function (x) { return x.d; });
    }

    function speciesOf(k) { return data.species[k]; }
    function pageOf(k) { return speciesOf(k)[2]; }

    function levelRows(l, qn, out) {
      var sp = speciesOf(l[0]), id = l[1], base = sp[1] + " · " + id + " " + termText(l[2]);
      var page = pageOf(l[0]);
      if (qn.j !== undefined && qn.j !== l[5]) return;
      var wantsLevelQn = qn.f !== undefined || qn.mf !== undefined || qn.mj !== undefined || qn.m !== undefined;
      if (!wantsLevelQn) {
        if (qn.mu === undefined && qn.ml === undefined) out.push({ kind: "level", href: page + "#level:" + id, label: base });
        return;
      }
      var mf = qn.mf !== undefined ? qn.mf : qn.mj === undefined ? qn.m : undefined;
      if (qn.mf !== undefined || qn.f !== undefined || (qn.m !== undefined && qn.mj === undefined)) {
        l[6].forEach(function (F2) {
          if (qn.f !== undefined && qn.f !== F2) return;
          if (mf === undefined) {
            out.push({ kind: "hyperfine level", href: page + "#level:" + id + ":F=" + fd(F2), label: base + " · F = " + fd(F2) });
            return;
          }
          mValues(F2).forEach(function (m2) {
            if (m2 === mf) out.push({ kind: "hyperfine sublevel", href: page + "#level:" + id + ":F=" + fd(F2) + ":mF=" + fd(m2), label: base + " · F = " + fd(F2) + ", mF = " + shown(m2) });
          });
        });
      }
      var mj = qn.mj !== undefined ? qn.mj : qn.f === undefined && qn.mf === undefined ? qn.m : undefined;
      if (mj !== undefined) {
        mValues(l[5]).forEach(function (m2) {
          if (m2 === mj) out.push({ kind: "sublevel", href: page + "#level:" + id + ":mJ=" + fd(m2), label: base + " · mJ = " + shown(m2) });
        });
      }
    }

    function lineRows(n, qn, out) {
      var sp = speciesOf(n[0]), id = n[1], page = pageOf(n[0]);
      var up = data.levels[n[2]], lo = data.levels[n[3]];
      var base = sp[1] + " · " + id;
      if (qn.f !== undefined || qn.mf !== undefined || qn.mj !== undefined || qn.j !== undefined || qn.m !== undefined) return;
      if (qn.mu === undefined && qn.ml === undefined) {
        out.push({ kind: "line", href: page + "#line:" + id, label: base + (n[4] ? " · " + n[4] + " nm" : "") + (up && lo ? " · " + up[1] + " → " + lo[1] : "") });
        return;
      }
      var c = n[7];
      for (var k = 0; k + 1 < c.length; k += 2) {
        var mu = c[k], ml = c[k + 1];
        if (qn.mu !== undefined && qn.mu !== mu) continue;
        if (qn.ml !== undefined && qn.ml !== ml) continue;
        var dm = (mu - ml) / 2;
        var pol = dm === 1 ? "σ+" : dm === -1 ? "σ" + MINUS : dm === 0 ? "π" : "Δm = " + shown(2 * dm);
        out.push({ kind: "Zeeman component", href: (n[8] || page) + "#line:" + id + ":mu=" + fd(mu) + ",ml=" + fd(ml), label: base + " · m " + shown(mu) + " → " + shown(ml) + " · " + pol });
      }
    }

    function search(text, limit) {
      var q = parseQuery(text);
      var rows = [];
      if (!q.words.length && !q.hasQn) return { rows: rows, total: 0 };
      var cap = 1000;
      var list = entities(q.words);
      for (var k = 0; k < list.length && rows.length < cap; k++) {
        var d = list[k];
        if (d.kind === "species") {
          if (!q.hasQn) { var s = data.species[d.i]; rows.push({ kind: "species", href: s[2], label: s[1] + " (" + s[0] + ")" }); }
        } else if (d.kind === "level") levelRows(data.levels[d.i], q.qn, rows);
        else lineRows(data.lines[d.i], q.qn, rows);
      }
      return { rows: rows.slice(0, limit || 25), total: rows.length, capped: rows.length >= cap };
    }

    /** Every row the finder can reach (for tests: each must be a row of its page). */
    function all() {
      var rows = [];
      data.species.forEach(function (s) { rows.push({ kind: "species", href: s[2], label: s[1] }); });
      data.levels.forEach(function (l) {
        levelRows(l, {}, rows);
        mValues(l[5]).forEach(function (m2) { levelRows(l, { mj: m2 }, rows); });
        l[6].forEach(function (F2) {
          levelRows(l, { f: F2 }, rows);
          mValues(F2).forEach(function (m2) { levelRows(l, { f: F2, mf: m2 }, rows); });
        });
      });
      data.lines.forEach(function (n) {
        lineRows(n, {}, rows);
        var c = n[7];
        for (var k = 0; k + 1 < c.length; k += 2) lineRows(n, { mu: c[k], ml: c[k + 1] }, rows);
      });
      return rows;
    }

    return { search: search, all: all };
  }

  root.AtlasFinder = { searchTokens: searchTokens, parseQuery: parseQuery, createFinder: createFinder, termText: termText };

  // ---- Page wiring ----
  if (typeof document === "undefined") return;
  function init() {
    var box = document.getElementById("finder");
    if (!box || !root.AtlasSearchData || !root.MiniSearch) return;
    var input = document.getElementById("finder-input");
    var list = document.getElementById("finder-results");
    var status = document.getElementById("finder-status");
    var base = document.body.getAttribute("data-root") || "./";
    var finder = null;
    box.hidden = false;

    function clear() { list.textContent = ""; list.hidden = true; status.textContent = ""; }
    function render() {
      var text = input.value;
      if (!text.trim()) { clear(); return; }
      if (!finder) finder = createFinder(root.AtlasSearchData, root.MiniSearch);
      var r = finder.search(text, 25);
      list.textContent = "";
      r.rows.forEach(function (row) {
        var li = document.createElement("li");
        var a = document.createElement("a");
        a.href = base + row.href;
        a.textContent = row.label;
        var kind = document.createElement("span");
        kind.className = "finder-kind";
        kind.textContent = row.kind;
        a.appendChild(document.createTextNode(" "));
        a.appendChild(kind);
        li.appendChild(a);
        list.appendChild(li);
      });
      list.hidden = r.rows.length === 0;
      status.textContent = r.total === 0 ? "No matches" :
        r.total > r.rows.length ? (r.capped ? "More than " + (r.total - 1) : r.total) + " matches, first " + r.rows.length + " shown" :
        r.total === 1 ? "1 match" : r.total + " matches";
    }
    function links() { return Array.prototype.slice.call(list.querySelectorAll("a")); }

    input.addEventListener("input", render);
    input.addEventListener("keydown", function (e) {
      var first = links()[0];
      if (e.key === "Enter" && first) { e.preventDefault(); first.click(); }
      else if (e.key === "ArrowDown" && first) { e.preventDefault(); first.focus(); }
      else if (e.key === "Escape") { input.value = ""; clear(); }
    });
    list.addEventListener("keydown", function (e) {
      var all = links(), at = all.indexOf(document.activeElement);
      if (e.key === "ArrowDown" && at + 1 < all.length) { e.preventDefault(); all[at + 1].focus(); }
      else if (e.key === "ArrowUp") { e.preventDefault(); if (at > 0) all[at - 1].focus(); else input.focus(); }
      else if (e.key === "Escape") { e.preventDefault(); input.focus(); clear(); }
    });
    // A jump within the page: fold the list away so the row is not covered or pushed.
    list.addEventListener("click", function (e) {
      if (e.target.closest && e.target.closest("a")) { list.hidden = true; }
    });
    input.addEventListener("focus", function () { if (input.value.trim()) render(); });
    clear();
    // Build the index once the page is idle, so the first keystroke is answered at once
    // (about 0.4 s of work for a 5,000-line atlas, see npm run bench:search).
    var warm = function () { if (!finder) finder = createFinder(root.AtlasSearchData, root.MiniSearch); };
    if (root.requestIdleCallback) root.requestIdleCallback(warm, { timeout: 2000 }); else setTimeout(warm, 0);
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
})(this);
