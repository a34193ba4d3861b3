/* Exitance report: glue between the report's data and the inlined libraries (ECharts, three.js).
   Draws the charts and the 3-D view; holds no plotting or rendering code of its own. */
(function () {
  'use strict';
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

  try {
    (data.charts || []).forEach(function (c) { if (c.kind === 'sankey') { sankeyChart(c); } else { bandChart(c); } });
  } catch (e) { fail('charts', e); }

  if (data.model) {
    try { model3d(data.model); } catch (e) { fail('3-D view', e); }
  }
  state.ready = true;
  document.body.setAttribute('data-ready', '1');

  function model3d(m) {
    var canvas = document.getElementById('view3d');
    var quantity = 'temperature';
    var lc = 0;
    var renderer = new THREE.WebGLRenderer({ canvas: canvas, antialias: true, preserveDrawingBuffer: true });
    renderer.setPixelRatio(1);
    renderer.setSize(canvas.clientWidth, canvas.clientHeight, false);
    renderer.setClearColor(0xffffff, 1);
    var scene = new THREE.Scene();
    var geom = new THREE.BufferGeometry();
    geom.setAttribute('position', new THREE.Float32BufferAttribute(m.positions, 3));
    var colours = new Float32Array(m.positions.length);
    geom.setAttribute('color', new THREE.BufferAttribute(colours, 3));
    geom.computeBoundingSphere();
    /* front faces only: a facet is seen from the side it radiates into, so from outside a closed
       enclosure the near walls drop away and the inside shows */
    var mesh = new THREE.Mesh(geom, new THREE.MeshBasicMaterial({ vertexColors: true, side: THREE.FrontSide }));
    scene.add(mesh);
    var edgeGeom = new THREE.BufferGeometry();
    edgeGeom.setAttribute('position', new THREE.Float32BufferAttribute(m.edges, 3));
    scene.add(new THREE.LineSegments(edgeGeom, new THREE.LineBasicMaterial({ color: 0x202020, transparent: true, opacity: 0.3 })));
    var highlight = null;

    var sphere = geom.boundingSphere;
    var camera = new THREE.PerspectiveCamera(35, canvas.clientWidth / canvas.clientHeight, sphere.radius / 100, sphere.radius * 20);
    camera.up.set(0, 0, 1);
    function place(cam, dir, up) {
      var d = new THREE.Vector3(dir[0], dir[1], dir[2]).normalize();
      cam.up.set(up[0], up[1], up[2]);
      cam.position.copy(sphere.center).addScaledVector(d, sphere.radius / Math.sin(THREE.MathUtils.degToRad(cam.fov / 2)) * 0.95);
      cam.lookAt(sphere.center);
      cam.updateProjectionMatrix();
    }
    var VIEWS = [
      { name: 'Oblique view', dir: [1.2, -1.6, 1.0], up: [0, 0, 1] },
      { name: 'From −y (front)', dir: [0, -1, 0], up: [0, 0, 1] },
      { name: 'From +z (top)', dir: [0, 0, 1], up: [0, 1, 0] },
      { name: 'From +x (side)', dir: [1, 0, 0], up: [0, 0, 1] }
    ];
    place(camera, VIEWS[0].dir, VIEWS[0].up);
    var controls = new OrbitControls(camera, canvas);
    controls.target.copy(sphere.center);
    controls.update();
    function render() { renderer.render(scene, camera); }
    controls.addEventListener('change', render);

    function values() {
      var c = m.loadCases[lc];
      return quantity === 'temperature' ? c.facetTemperatureK : c.facetNetFluxWPerM2;
    }
    function range(v) {
      var known = v.filter(function (x) { return x !== null; });
      var lo = Math.min.apply(null, known), hi = Math.max.apply(null, known);
      if (!(hi > lo)) { var pad = Math.max(Math.abs(lo) * 0.005, 0.5); lo -= pad; hi += pad; }
      return [lo, hi];
    }
    function label() { return quantity === 'temperature' ? 'Temperature, K' : 'Net radiative flux, W/m² (positive: loses heat)'; }
    function fmt(v) { return quantity === 'temperature' ? temperature(v) : power(v); }
    var tmp = new THREE.Color();
    function colour() {
      var v = values(), r = range(v);
      for (var t = 0; t < m.triangleFacet.length; t++) {
        var value = v[m.triangleFacet[t]];
        var rgb = value === null ? [0.75, 0.75, 0.75] : viridis((value - r[0]) / (r[1] - r[0]));
        tmp.setRGB(rgb[0], rgb[1], rgb[2], THREE.SRGBColorSpace);
        for (var k = 0; k < 3; k++) {
          colours[9 * t + 3 * k] = tmp.r; colours[9 * t + 3 * k + 1] = tmp.g; colours[9 * t + 3 * k + 2] = tmp.b;
        }
      }
      geom.attributes.color.needsUpdate = true;
      drawBar(document.getElementById('colorbar'), r, 12);
      render();
      stills(r);
    }
    /* the colour bar: a gradient of the same map with five labelled ticks and the unit */
    function drawBar(bar, r, px) {
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
      g.fillText(quantity === 'temperature' ? 'T, K' : 'q, W/m²', x0, 6);
      document.getElementById('colorbar-label').textContent = label() + ', load case ' + m.loadCases[lc].name;
    }

    var stillRenderer = null;
    function stills(r) {
      var holder = document.getElementById('stills');
      if (!stillRenderer) {
        var off = document.createElement('canvas');
        off.width = 520; off.height = 440;
        stillRenderer = new THREE.WebGLRenderer({ canvas: off, antialias: true, preserveDrawingBuffer: true });
        stillRenderer.setPixelRatio(1);
        stillRenderer.setSize(520, 440, false);
        stillRenderer.setClearColor(0xffffff, 1);
      }
      var cam = new THREE.PerspectiveCamera(35, 520 / 440, sphere.radius / 100, sphere.radius * 20);
      var bar = document.createElement('canvas'); bar.width = 150; bar.height = 440;
      drawBar(bar, r, 17);
      holder.innerHTML = '';
      VIEWS.forEach(function (view) {
        place(cam, view.dir, view.up);
        stillRenderer.render(scene, cam);
        var sheet = document.createElement('canvas'); sheet.width = 670; sheet.height = 440;
        var g = sheet.getContext('2d');
        g.drawImage(stillRenderer.domElement, 0, 0);
        g.drawImage(bar, 520, 0);
        var fig = document.createElement('figure');
        var img = document.createElement('img');
        img.alt = view.name + ', coloured by ' + label().toLowerCase();
        img.src = sheet.toDataURL('image/png');
        var cap = document.createElement('figcaption');
        cap.textContent = view.name + ' — ' + label() + ' (' + m.loadCases[lc].name + ')';
        fig.appendChild(img); fig.appendChild(cap); holder.appendChild(fig);
      });
      state.stills = VIEWS.length;
    }

    /* picking: a click (not a drag) on a facet shows its surface's values */
    var ray = new THREE.Raycaster(), down = null;
    canvas.addEventListener('pointerdown', function (e) { down = [e.clientX, e.clientY]; });
    canvas.addEventListener('pointerup', function (e) {
      if (!down || Math.abs(e.clientX - down[0]) + Math.abs(e.clientY - down[1]) > 4) { return; }
      var box = canvas.getBoundingClientRect();
      var ndc = new THREE.Vector2((e.clientX - box.left) / box.width * 2 - 1, -((e.clientY - box.top) / box.height) * 2 + 1);
      ray.setFromCamera(ndc, camera);
      var hit = ray.intersectObject(mesh, false)[0];
      if (hit) { show(m.triangleFacet[hit.faceIndex]); }
    });
    var select = document.getElementById('pick-select');
    select.addEventListener('change', function () {
      var s = parseInt(select.value, 10);
      if (s >= 0) { show(m.facetSurface.indexOf(s)); }
    });
    function show(facet) {
      var s = m.facetSurface[facet], c = m.loadCases[lc], sv = c.surfaces[s];
      var rows = sv.solved ? [['Surface', m.surfaces[s]], ['Load case', c.name], ['Temperature, K', temperature(sv.temperatureK)],
        ['Net heat, W', power(sv.netHeatW)], ['Net flux, W/m²', power(sv.netFluxWPerM2)], ['Area, m²', sv.areaM2.toPrecision(5)]]
        : [['Surface', m.surfaces[s]], ['Load case', c.name], ['Result', 'none for this surface (drawn grey)']];
      if (c.facetResolved && c.facetTemperatureK[facet] !== null) {
        rows.push(['Facet', m.facetLabel[facet]], ['Facet temperature, K', temperature(c.facetTemperatureK[facet])],
          ['Facet net flux, W/m²', power(c.facetNetFluxWPerM2[facet])]);
      }
      var dl = document.getElementById('pick-values');
      dl.innerHTML = '';
      rows.forEach(function (r, i) {
        var dt = document.createElement('dt'), dd = document.createElement('dd');
        dt.textContent = r[0]; dd.textContent = r[1]; dd.setAttribute('data-row', String(i));
        dl.appendChild(dt); dl.appendChild(dd);
      });
      document.getElementById('pick').setAttribute('data-surface', m.surfaces[s]);
      select.value = String(s);
      if (highlight) { scene.remove(highlight); }
      var seg = [];
      for (var k = 0; k < m.edgeFacet.length; k++) {
        if (m.facetSurface[m.edgeFacet[k]] === s) { for (var j = 0; j < 6; j++) { seg.push(m.edges[6 * k + j]); } }
      }
      var hg = new THREE.BufferGeometry();
      hg.setAttribute('position', new THREE.Float32BufferAttribute(seg, 3));
      highlight = new THREE.LineSegments(hg, new THREE.LineBasicMaterial({ color: 0xe8175d, depthTest: false }));
      scene.add(highlight);
      render();
    }

    document.querySelectorAll('input[name="quantity"]').forEach(function (el) {
      el.addEventListener('change', function () { if (el.checked) { quantity = el.value; colour(); } });
    });
    var lcSelect = document.getElementById('loadcase-select');
    if (lcSelect) { lcSelect.addEventListener('change', function () { lc = parseInt(lcSelect.value, 10); colour(); }); }
    document.getElementById('view-reset').addEventListener('click', function () {
      place(camera, VIEWS[0].dir, VIEWS[0].up); controls.target.copy(sphere.center); controls.update(); render();
    });
    colour();
  }
})();
