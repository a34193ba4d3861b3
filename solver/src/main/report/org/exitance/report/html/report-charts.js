
function bandChart(c) {
  var el = document.getElementById(c.id);
  var chart = echarts.init(el, null, { renderer: 'canvas' });
  var n = c.series.length;
  chart.setOption({
    animation: false,
    aria: { enabled: true, decal: { show: true } },
    color: c.series.map(function (s, k) { return hex(viridis(n === 1 ? 0.45 : 0.92 * k / (n - 1))); }),
    title: { text: c.title, left: 'center', textStyle: { fontSize: 14 } },
    tooltip: { trigger: 'axis', axisPointer: { type: 'shadow' } },
    legend: { top: 28, type: 'scroll' },
    grid: { top: 72, left: 96, right: 30, bottom: 70 },
    xAxis: { type: 'category', data: c.bands, name: 'Band, µm', nameLocation: 'middle', nameGap: 48,
      axisLabel: { rotate: c.bands.length > 6 ? 40 : 0 } },
    yAxis: { type: 'value', name: 'Net heat, W', nameLocation: 'middle', nameGap: 72 },
    series: c.series.map(function (name, i) {
      return { name: name, type: 'bar', data: c.values[i] };
    })
  });
  state.charts++;
}

function sankeyChart(c) {
  var el = document.getElementById(c.id);
  var chart = echarts.init(el, null, { renderer: 'canvas' });
  var n = c.nodes.length;
  chart.setOption({
    animation: false,
    aria: { enabled: true },
    title: { text: c.title, left: 'center', textStyle: { fontSize: 14 } },
    tooltip: { trigger: 'item', formatter: function (p) {
      return p.dataType === 'edge' ? p.data.source.replace(/ \(from\)$/, '') + ' → ' + p.data.target.replace(/ \(to\)$/, '')
        + ': ' + power(p.data.value) + ' W' : p.name.replace(/ \((from|to)\)$/, '') + ': ' + power(p.data.value) + ' W';
    } },
    series: [{
      type: 'sankey', top: 50, bottom: 20, left: 20, right: 160, nodeGap: 10,
      emphasis: { focus: 'adjacency' },
      lineStyle: { color: 'gradient', opacity: 0.45 },
      label: { formatter: function (p) { return p.name.replace(/ \((from|to)\)$/, '') + '  ' + power(p.data.value) + ' W'; } },
      data: c.nodes.map(function (node, k) {
        return { name: node.name, value: node.value,
          itemStyle: { color: hex(viridis(n === 1 ? 0.45 : 0.92 * k / (n - 1))), borderColor: '#222' } };
      }),
      links: c.links
    }]
  });
  state.charts++;
}

/* lines against time (c.x: the instants, in c.xName's unit): one series per node, the legend
   selects them; every instant carries a symbol, the instant the model shows is a dashed vertical
   line (series "instant", updated by markInstant), and c.bands (if any) are shaded intervals */
var lineCharts = [];
function lineChart(c) {
  var el = document.getElementById(c.id);
  var chart = echarts.init(el, null, { renderer: 'canvas' });
  var n = c.series.length, selected = {};
  c.series.forEach(function (s) { selected[s.name] = s.shown; });
  var series = c.series.map(function (s) {
    return { name: s.name, type: 'line', showSymbol: true, symbolSize: 5,
      data: s.values.map(function (v, i) { return [c.x[i], v]; }) };
  });
  series.push({ id: 'instant', name: 'instant', type: 'line', data: [], silent: true,
    markLine: { symbol: 'none', silent: true, animation: false, lineStyle: { color: '#e8175d', type: 'dashed' },
      label: { show: false }, data: [] } });
  if (c.bands && c.bands.length) {
    series.push({ id: 'bands', name: 'bands', type: 'line', data: [], silent: true,
      markArea: { silent: true, itemStyle: { color: 'rgba(232, 23, 93, 0.10)' }, label: { show: false },
        data: c.bands.map(function (b) { return [{ xAxis: b.from }, { xAxis: b.to }]; }) } });
  }
  chart.setOption({
    animation: false,
    aria: { enabled: true },
    color: c.series.map(function (s, k) { return hex(viridis(n === 1 ? 0.45 : 0.92 * k / (n - 1))); }),
    title: { text: c.title, left: 'center', textStyle: { fontSize: 14 } },
    tooltip: { trigger: 'axis', valueFormatter: function (v) { return typeof v === 'number' ? c.format === 'temperature'
      ? temperature(v) : power(v) : v; } },
    legend: { top: 28, type: 'scroll', data: c.series.map(function (s) { return s.name; }), selected: selected },
    grid: { top: 72, left: 96, right: 40, bottom: 60 },
    xAxis: { type: 'value', name: c.xName, nameLocation: 'middle', nameGap: 32, min: c.x[0], max: c.x[c.x.length - 1] },
    yAxis: { type: 'value', name: c.yName, nameLocation: 'middle', nameGap: 72, scale: true },
    series: series
  });
  chart.on('click', function (p) { if (p.componentType === 'series' && p.seriesId !== 'instant' && state.setInstant) { state.setInstant(p.dataIndex); } });
  lineCharts.push({ chart: chart, x: c.x });
  state.charts++;
}
function markInstant(i) {
  lineCharts.forEach(function (l) {
    l.chart.setOption({ series: [{ id: 'instant', markLine: { data: [{ xAxis: l.x[i] }] } }] });
  });
}
