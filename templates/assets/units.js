/* Sublevel Atlas unit choice for shift columns: Hz, kHz, MHz, GHz or cm⁻¹,
   per tesla or per gauss, remembered across pages. Applies to columns whose
   <th> has data-switchable; each cell carries its exact value in Hz/T
   (data-hz-per-t). Powers of ten are exact decimal shifts; cm⁻¹ divides by
   100·c = 29 979 245 800 cm/s, exactly, in BigInt. Rounding (9 significant
   digits, half to even), thin-space grouping and the true minus follow the
   server's formatting (src/site/format.ts), so the default MHz/G computed
   here equals the server's text. Without JavaScript the server's MHz/G
   stays. Classic script. */
(function (root) {
  "use strict";

  var THIN = "\u2009", MINUS = "\u2212";
  var SUP = { "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻" };
  var HZ_PER_WAVENUMBER = BigInt("29979245800"); // 100·c in cm/s: 1 cm⁻¹ ↔ c·(1 cm⁻¹) Hz, exact
  var FREQ = { "Hz": 0, "kHz": 3, "MHz": 6, "GHz": 9, "cm⁻¹": null };
  var FIELD = { "T": 0, "G": 4 }; // Hz/G = Hz/T × 10⁻⁴ (1 G = 10⁻⁴ T, exact)
  var UNITS = ["Hz/T", "kHz/T", "MHz/T", "GHz/T", "cm⁻¹/T", "Hz/G", "kHz/G", "MHz/G", "GHz/G", "cm⁻¹/G"];
  var DEFAULT = "MHz/G";
  var KEY = "sublevel-atlas:shift-unit";
  var SIG = 9;

  function pow10(k) { return BigInt("1" + "0".repeat(k)); }
  function digitsOf(b) { return b.toString().length; }

  /** A decimal string as sign, integer mantissa and power of ten, or null. */
  function parse(text) {
    var m = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text.trim());
    if (!m || (m[2] || "") + (m[3] || "") === "") return null;
    var frac = m[3] || "";
    return { neg: m[1] === "-", n: BigInt((m[2] || "") + frac || "0"), e: (m[4] ? parseInt(m[4], 10) : 0) - frac.length };
  }

  /** Round num/den (positive BigInts) to `sig` significant digits, half to even: digits and the exponent of the first. */
  function roundSig(num, den, sig) {
    var e = digitsOf(num) - digitsOf(den);
    if (e >= 0 ? num < den * pow10(e) : num * pow10(-e) < den) e--;
    var t = sig - 1 - e, n2 = num, d2 = den;
    if (t >= 0) n2 = num * pow10(t); else d2 = den * pow10(-t);
    var q = n2 / d2, r = n2 % d2;
    if (2n * r > d2 || (2n * r === d2 && q % 2n === 1n)) q += 1n;
    if (q === pow10(sig)) { q = pow10(sig - 1); e++; }
    return { d: q.toString(), e: e };
  }

  function group(digits, fromLeft) {
    if (digits.length <= 4) return digits;
    var parts = [], i;
    if (fromLeft) for (i = 0; i < digits.length; i += 3) parts.push(digits.slice(i, i + 3));
    else for (i = digits.length; i > 0; i -= 3) parts.unshift(digits.slice(Math.max(0, i - 3), i));
    return parts.join(THIN);
  }

  /** A value in Hz/T shown in `unit` (one of UNITS): { sign, int, frac, exp } like numberParts in src/site/format.ts. */
  function convert(hzPerT, unit) {
    var p = parse(hzPerT);
    if (!p) return null;
    var slash = unit.lastIndexOf("/"), f = unit.slice(0, slash), b = unit.slice(slash + 1);
    if (!(f in FREQ) || !(b in FIELD)) return null;
    if (p.n === 0n) return { sign: "", int: "0", frac: "", exp: "" };
    // value = n · 10^(e − shift) / den
    var shift = (FREQ[f] === null ? 0 : FREQ[f]) + FIELD[b];
    var den = FREQ[f] === null ? HZ_PER_WAVENUMBER : 1n;
    var x = p.e - shift, num = p.n;
    if (x >= 0) num = num * pow10(x); else den = den * pow10(-x);
    var r = roundSig(num, den, SIG);
    var sign = p.neg ? MINUS : "";
    if (r.e >= 12 || r.e <= -6) {
      var mant = r.d.slice(1).replace(/0+$/, "");
      var exp = "×10" + Array.from(String(r.e)).map(function (c) { return SUP[c] || c; }).join("");
      return { sign: sign, int: r.d.charAt(0), frac: mant ? "." + group(mant, true) : "", exp: exp };
    }
    var intPart, frac;
    if (r.e >= 0) {
      intPart = r.d.slice(0, r.e + 1);
      while (intPart.length < r.e + 1) intPart += "0";
      frac = r.d.slice(r.e + 1);
    } else {
      intPart = "0";
      frac = "0".repeat(-r.e - 1) + r.d;
    }
    return { sign: sign, int: group(intPart, false), frac: frac ? "." + group(frac, true) : "", exp: "" };
  }

  root.AtlasUnits = { convert: convert, UNITS: UNITS, DEFAULT: DEFAULT };
  if (typeof document === "undefined") return;

  // Storage can throw (file:// in some browsers, private modes, disabled storage): never let it break the page.
  function load() {
    try { var v = root.localStorage.getItem(KEY); return UNITS.indexOf(v) >= 0 ? v : DEFAULT; } catch (e) { return DEFAULT; }
  }
  function save(v) { try { root.localStorage.setItem(KEY, v); } catch (e) { /* not remembered */ } }

  var FIGURE = "\u2007", PUNCT = "\u2008";
  function raw(s) { return s.split(THIN).join(""); }
  function regroup(digits, fromLeft, force) {
    if (digits.length <= (force ? 3 : 4)) return digits;
    return groupAll(digits, fromLeft);
  }
  function groupAll(digits, fromLeft) {
    var parts = [], i;
    if (fromLeft) for (i = 0; i < digits.length; i += 3) parts.push(digits.slice(i, i + 3));
    else for (i = digits.length; i > 0; i -= 3) parts.unshift(digits.slice(Math.max(0, i - 3), i));
    return parts.join(THIN);
  }
  /** Width right of the decimal point per kind of space, as the server's decimal alignment counts it (src/site/table.ts). */
  function rightWidth(p) {
    var w = { fig: 0, punct: 0, thin: 0 };
    Array.from(p.frac + p.exp).forEach(function (ch) {
      if (/[0-9]/.test(ch) || ch === "×") w.fig++;
      else if (ch === THIN) w.thin++;
      else w.punct++;
    });
    return w;
  }
  /** One column's numbers grouped alike and padded so their decimal points line up, like the server's. */
  function align(list) {
    var forceInt = list.some(function (p) { return raw(p.int).length > 4; });
    var forceFrac = list.some(function (p) { return raw(p.frac).length - 1 > 4; });
    list.forEach(function (p) {
      p.int = regroup(raw(p.int), false, forceInt);
      if (p.frac) p.frac = "." + regroup(raw(p.frac).slice(1), true, forceFrac);
    });
    var ws = list.map(rightWidth);
    var max = { fig: 0, punct: 0, thin: 0 };
    ws.forEach(function (w) { for (var k in max) max[k] = Math.max(max[k], w[k]); });
    list.forEach(function (p, i) {
      p.pad = FIGURE.repeat(max.fig - ws[i].fig) + PUNCT.repeat(max.punct - ws[i].punct) + THIN.repeat(max.thin - ws[i].thin);
    });
  }

  /** Cell markup as the server writes it (templates/_includes/macros.njk). */
  function fill(td, parts) {
    var n = document.createElement("span");
    n.className = "n";
    n.appendChild(document.createTextNode(parts.sign + parts.int));
    var fr = document.createElement("span");
    fr.className = "frac";
    fr.textContent = parts.frac + parts.exp;
    n.appendChild(fr);
    if (parts.pad) {
      var pad = document.createElement("span");
      pad.className = "pad";
      pad.textContent = parts.pad;
      n.appendChild(pad);
    }
    td.textContent = "";
    td.appendChild(n);
  }

  function apply(unit) {
    Array.prototype.forEach.call(document.querySelectorAll("table.atlas-table"), function (table) {
      var head = table.tHead && table.tHead.rows[0];
      if (!head) return;
      Array.prototype.forEach.call(head.cells, function (th, col) {
        if (!th.hasAttribute("data-switchable")) return;
        var u = th.querySelector(".unit");
        if (u) u.textContent = "(" + unit + ")";
        var tds = [], list = [];
        Array.prototype.forEach.call(table.tBodies, function (tb) {
          Array.prototype.forEach.call(tb.rows, function (tr) {
            var td = tr.cells[col];
            var v = td && td.getAttribute("data-hz-per-t");
            var parts = v ? convert(v, unit) : null;
            if (parts) { tds.push(td); list.push(parts); }
          });
        });
        align(list);
        tds.forEach(function (td, i) { fill(td, list[i]); });
      });
    });
  }

  function init() {
    if (!document.querySelector("th[data-switchable]")) return;
    var box = document.createElement("div");
    box.className = "unit-switch";
    var label = document.createElement("label");
    label.setAttribute("for", "unit-choice");
    label.textContent = "Shift unit";
    var select = document.createElement("select");
    select.id = "unit-choice";
    UNITS.forEach(function (u) {
      var o = document.createElement("option");
      o.value = u;
      o.textContent = u;
      select.appendChild(o);
    });
    var unit = load();
    select.value = unit;
    box.appendChild(label);
    box.appendChild(select);
    var finder = document.getElementById("finder");
    var host = finder && finder.parentNode ? finder.parentNode : document.body;
    host.insertBefore(box, finder ? finder.nextSibling : host.firstChild);
    if (unit !== DEFAULT) apply(unit);
    select.addEventListener("change", function () { save(select.value); apply(select.value); });
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
})(this);
