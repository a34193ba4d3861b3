/* The instants of a transient (t: data.time): a slider and buttons step through them; the 3-D
   view (model), the node table of a case without geometry and the charts' instant line follow. */
function timeline(t, model) {
  var slider = document.getElementById('instant');
  if (!slider) { return; }
  var last = t.instants.length - 1, table = document.getElementById('instant-nodes');
  var bar = document.getElementById('node-colorbar');
  if (bar) { drawBar(bar, t.rangeK, 12, temperature, 'T, K'); }
  function nodes(i) {
    if (!table) { return; }
    table.querySelectorAll('tbody tr').forEach(function (row) {
      var k = parseInt(row.getAttribute('data-index'), 10), v = t.temperatureK[i][k];
      row.querySelector('td.t-k').textContent = temperature(v);
      row.querySelector('td.q-w').textContent = power(t.netRadiationW[i][k]);
      row.querySelector('td.h-w').textContent = power(t.heaterW[i][k]);
      row.querySelector('span.swatch').style.backgroundColor = hex(viridis((v - t.rangeK[0]) / (t.rangeK[1] - t.rangeK[0])));
    });
    table.setAttribute('data-instant', String(i));
  }
  function set(i) {
    i = Math.max(0, Math.min(last, i));
    slider.value = String(i);
    slider.setAttribute('aria-valuetext', t.instants[i]);
    document.getElementById('instant-label').textContent = t.instants[i];
    if (model) { model.setFrame(i); }
    nodes(i);
    markInstant(i);
    state.instant = i;
  }
  slider.addEventListener('input', function () { set(parseInt(slider.value, 10)); });
  var steps = { 'instant-first': function () { return 0; }, 'instant-prev': function () { return state.instant - 1; },
    'instant-next': function () { return state.instant + 1; }, 'instant-last': function () { return last; } };
  Object.keys(steps).forEach(function (id) {
    document.getElementById(id).addEventListener('click', function () { set(steps[id]()); });
  });
  state.setInstant = set;
  set(t.first);
}
