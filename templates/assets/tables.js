/* Sublevel Atlas tables: a filter box above every table.atlas-table, sorting
   by any column (header buttons with aria-sort), and row links that copy the
   row's full URL. Progressive enhancement: without JavaScript the tables are
   complete and every row link still jumps to its row. Classic script. */
(function (root) {
  "use strict";

  // ---- Sort keys: exact comparison of decimal strings (data-sort), no floating point. ----
  var DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;
  /** A decimal string as sign, digits and exponent (value = ±0.digits × 10^e), or null. */
  function decimalKey(s) {
    var m = DECIMAL.exec(s);
    if (!m || (m[2] || "") + (m[3] || "") === "") return null;
    var digits = (m[2] || "") + (m[3] || ""), e = (m[2] || "").length + (m[4] ? parseInt(m[4], 10) : 0);
    while (digits.charAt(0) === "0") { digits = digits.slice(1); e--; }
    digits = digits.replace(/0+$/, "");
    if (digits === "") return { sign: 0, d: "", e: 0 };
    return { sign: m[1] === "-" ? -1 : 1, d: digits, e: e };
  }
  function compareDecimal(a, b) {
    if (a.sign !== b.sign) return a.sign < b.sign ? -1 : 1;
    if (a.sign === 0) return 0;
    var mag = a.e !== b.e ? (a.e < b.e ? -1 : 1) : a.d < b.d ? -1 : a.d > b.d ? 1 : 0;
    return a.sign * mag;
  }
  /** Text as the filter and the sort see it: true minus and thin spaces folded. */
  function plain(s) { return s.replace(/\u2212/g, "-").replace(/[\u2009\u202f\u00a0]/g, "").trim(); }
  /** A cell's sort key: data-sort, else its text with thin and no-break spaces dropped ("—" is empty).
      The page writes data-sort only where that would differ (src/site/sortKey.ts mirrors this). */
  function sortText(td) {
    var s = td.getAttribute("data-sort");
    if (s === null) { s = td.textContent.replace(/[\u2009\u202f\u00a0]/g, "").trim(); if (s === "—") s = ""; }
    return s;
  }

  root.AtlasTables = { decimalKey: decimalKey, compareDecimal: compareDecimal };
  if (typeof document === "undefined") return;

  var counter = 0;

  function enhance(table) {
    var tbody = table.tBodies[0];
    var head = table.tHead && table.tHead.rows[0];
    if (!tbody || !head) return;
    var rows = Array.prototype.slice.call(tbody.rows);
    var n = ++counter;
    // The caption's own words, without its download links.
    var caption = table.caption ? plain(Array.prototype.map.call(table.caption.childNodes, function (c) {
      return c.nodeType === 1 && c.tagName === "A" ? "" : c.textContent;
    }).join("")) : "";

    // Filter box, inserted above the table (or its scroll wrapper).
    var tools = document.createElement("div");
    tools.className = "table-tools";
    if (table.id) tools.setAttribute("data-for", table.id);
    var label = document.createElement("label");
    label.className = "table-filter";
    label.setAttribute("for", "table-filter-" + n);
    label.textContent = "Filter rows";
    var input = document.createElement("input");
    input.type = "search";
    input.id = "table-filter-" + n;
    input.autocomplete = "off";
    input.spellcheck = false;
    input.setAttribute("aria-label", "Filter rows" + (caption ? ": " + caption : ""));
    var count = document.createElement("span");
    count.className = "table-count";
    count.setAttribute("aria-live", "polite");
    tools.appendChild(label);
    tools.appendChild(input);
    tools.appendChild(count);
    var wrap = table.parentElement && table.parentElement.classList.contains("table-wrap") ? table.parentElement : table;
    wrap.parentNode.insertBefore(tools, wrap);

    var texts = rows.map(function (r) { return plain(r.textContent).toLowerCase(); });
    function applyFilter() {
      var words = plain(input.value).toLowerCase().split(/\s+/).filter(Boolean);
      var shown = 0;
      rows.forEach(function (r, k) {
        var ok = words.every(function (w) { return texts[k].indexOf(w) >= 0; });
        r.hidden = !ok;
        if (ok) shown++;
      });
      count.textContent = words.length ? shown + " of " + rows.length + " rows" : "";
    }
    input.addEventListener("input", applyFilter);
    table.atlasClearFilter = function () { input.value = ""; applyFilter(); };

    // Sort buttons in the header cells.
    var ths = Array.prototype.slice.call(head.cells);
    ths.forEach(function (th, col) {
      if (th.classList.contains("k-link")) return;
      var button = document.createElement("button");
      button.type = "button";
      button.className = "sort";
      while (th.firstChild) button.appendChild(th.firstChild);
      th.appendChild(button);
      button.addEventListener("click", function () {
        var dir = th.getAttribute("aria-sort") === "ascending" ? "descending" : "ascending";
        ths.forEach(function (other) { other.removeAttribute("aria-sort"); });
        th.setAttribute("aria-sort", dir);
        sortBy(col, dir === "ascending" ? 1 : -1);
      });
    });

    function sortBy(col, dir) {
      var keys = rows.map(function (r) { var td = r.cells[col]; return td ? sortText(td) : ""; });
      var nums = keys.map(function (k) { return k === "" ? null : decimalKey(plain(k)); });
      var numeric = keys.every(function (k, i) { return k === "" || nums[i] !== null; });
      var order = rows.map(function (r, i) { return i; });
      order.sort(function (a, b) {
        var ea = keys[a] === "", eb = keys[b] === "";
        if (ea || eb) return ea === eb ? a - b : ea ? 1 : -1; // empty cells last, both ways
        var c = numeric ? compareDecimal(nums[a], nums[b]) : keys[a].localeCompare(keys[b], "en", { numeric: true });
        return c * dir || a - b;
      });
      var frag = document.createDocumentFragment();
      order.forEach(function (i) { frag.appendChild(rows[i]); });
      tbody.appendChild(frag);
    }
  }

  // ---- Copy-link ----
  var announcer = null;
  function announce(text) {
    if (!announcer) {
      announcer = document.createElement("div");
      announcer.className = "visually-hidden";
      announcer.id = "atlas-announce";
      announcer.setAttribute("role", "status");
      announcer.setAttribute("aria-live", "polite");
      document.body.appendChild(announcer);
    }
    announcer.textContent = "";
    // A fresh text node each time so repeated copies are announced again.
    setTimeout(function () { announcer.textContent = text; }, 30);
  }
  function copyFallback(text) {
    var area = document.createElement("textarea");
    area.value = text;
    area.setAttribute("readonly", "");
    area.style.position = "fixed";
    area.style.opacity = "0";
    document.body.appendChild(area);
    area.select();
    var ok = false;
    try { ok = document.execCommand("copy"); } catch (e) { ok = false; }
    document.body.removeChild(area);
    return ok;
  }
  function copy(text) {
    if (navigator.clipboard && navigator.clipboard.writeText) {
      return navigator.clipboard.writeText(text).then(function () { return true; }, function () { return copyFallback(text); });
    }
    return Promise.resolve(copyFallback(text));
  }
  document.addEventListener("click", function (e) {
    var a = e.target.closest ? e.target.closest("a.row-link") : null;
    if (!a || e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
    var href = a.getAttribute("href") || "";
    if (href.charAt(0) !== "#") return;
    e.preventDefault();
    var url = location.href.split("#")[0] + href;
    var row = a.closest("tr");
    copy(url).then(function (ok) {
      if (ok) {
        var old = document.querySelector("tr.row-copied");
        if (old) old.classList.remove("row-copied");
        if (row) row.classList.add("row-copied");
        announce("Link copied");
      } else {
        location.hash = href;
        announce("Could not copy; the row's link is now in the address bar");
      }
    });
  });

  // A row reached by its anchor is shown even when a filter had hidden it.
  function reveal() {
    var id = location.hash.slice(1);
    if (!id) return;
    var el = document.getElementById(id);
    try { if (!el) el = document.getElementById(decodeURIComponent(id)); } catch (e) { /* malformed escape */ }
    if (!el || !el.hidden) return;
    var table = el.closest("table");
    if (table && table.atlasClearFilter) { table.atlasClearFilter(); el.scrollIntoView(); }
  }

  function init() {
    Array.prototype.forEach.call(document.querySelectorAll("table.atlas-table"), enhance);
    window.addEventListener("hashchange", reveal);
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
})(this);
