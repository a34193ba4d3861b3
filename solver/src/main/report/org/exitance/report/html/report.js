/* Exitance report: glue between the report's data and the inlined libraries (ECharts, three.js).
   Draws the charts and the 3-D view; holds no plotting or rendering code of its own. The page
   writer joins this file and report-charts.js, report-model.js and report-time.js into one
   function scope and calls run() at the end. */
var data = JSON.parse(document.getElementById('report-data').textContent);
var state = { ready: false, charts: 0, stills: 0 };
window.exitanceReport = state;

/* viridis (van der Walt & Smith, matplotlib 2015), sampled at tenths: a perceptually uniform
   sequential map whose lightness rises steadily, so it reads in grey print and for the
   common colour-vision deficiencies. Hex values from memory of the published map. */
var VIRIDIS = ['#440154', '#482475', '#414487', '#355f8d', '#2a788e', '#21918c', '#22a884',
  '#44bf70', '#7ad151', '#bddf26', '#fde725'];
function rgbOf(hex) {
  return [parseInt(hex.substr(1, 2), 16) / 255, parseInt(hex.substr(3, 2), 16) / 255, parseInt(hex.substr(5, 2), 16) / 255];
}
var STOPS = VIRIDIS.map(rgbOf);
function viridis(t) {
  t = Math.min(1, Math.max(0, t)) * (STOPS.length - 1);
  var i = Math.min(STOPS.length - 2, Math.floor(t));
  var f = t - i;
  return [0, 1, 2].map(function (c) { return STOPS[i][c] + (STOPS[i + 1][c] - STOPS[i][c]) * f; });
}
function hex(rgb) {
  return '#' + rgb.map(function (v) { return ('0' + Math.round(v * 255).toString(16)).slice(-2); }).join('');
}
/* the number formats of the text tables */
function power(w) {
  var a = Math.abs(w);
  if (a < 1e-9) { return '0.00'; }
  if (a < 1e-3 || a >= 1e9) { return w.toExponential(4); }
  return w.toFixed(2);
}
function temperature(t) { return t.toFixed(2); }

function fail(where, e) {
  var el = document.getElementById('script-problem');
  if (el) { el.hidden = false; el.textContent = where + ': ' + e; }
  console.error(where, e);
}

/* the lowest and highest of the non-null values of some arrays, widened when they are equal */
function rangeOf(arrays) {
  var lo = Infinity, hi = -Infinity;
  arrays.forEach(function (v) { v.forEach(function (x) { if (x !== null) { lo = Math.min(lo, x); hi = Math.max(hi, x); } }); });
  if (!(hi > lo)) { var pad = Math.max(Math.abs(lo) * 0.005, 0.5); lo -= pad; hi += pad; }
  return [lo, hi];
}

/* a colour bar: a gradient of the map on a canvas with five labelled ticks and a unit heading */
function drawBar(bar, r, px, fmt, unit) {
  var g = bar.getContext('2d'), w = bar.width, h = bar.height, top = 2.4 * px, bottom = h - 1.2 * px, x0 = 8, bw = 22;
  g.fillStyle = '#fff'; g.fillRect(0, 0, w, h);
  var grad = g.createLinearGradient(0, bottom, 0, top);
  for (var k = 0; k <= 20; k++) { grad.addColorStop(k / 20, hex(viridis(k / 20))); }
  g.fillStyle = grad; g.fillRect(x0, top, bw, bottom - top);
  g.strokeStyle = '#222'; g.strokeRect(x0 + 0.5, top + 0.5, bw, bottom - top);
  g.fillStyle = '#111'; g.font = px + 'px sans-serif'; g.textBaseline = 'middle';
  for (var i = 0; i <= 4; i++) {
    var y = bottom - (bottom - top) * i / 4;
    g.fillRect(x0 + bw, y, 5, 1);
    g.fillText(fmt(r[0] + (r[1] - r[0]) * i / 4), x0 + bw + 8, y);
  }
  g.textBaseline = 'top'; g.font = 'bold ' + px + 'px sans-serif';
  g.fillText(unit, x0, 6);
  bar.setAttribute('data-range', r[0] + ' ' + r[1]);
}

function run() {
  try {
    (data.charts || []).forEach(function (c) {
      if (c.kind === 'sankey') { sankeyChart(c); } else if (c.kind === 'lines') { lineChart(c); } else { bandChart(c); }
    });
  } catch (e) { fail('charts', e); }
  var model = null;
  if (data.model) {
    try { model = model3d(data.model); } catch (e) { fail('3-D view', e); }
  }
  if (data.time) {
    try { timeline(data.time, model); } catch (e) { fail('instants', e); }
  }
  state.ready = true;
  document.body.setAttribute('data-ready', '1');
}
