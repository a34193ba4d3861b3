/* The 3-D view. m.frames: the coloured states (the load cases of a solve, the instants of a
   transient; m.frameKind names them); m.commonScale: one colour scale over every frame;
   m.stillFrames: the frames of the still pictures (oblique view each), else the four views of
   the frame shown. Returns {setFrame(i)}. */
function model3d(m) {
  var canvas = document.getElementById('view3d');
  var quantity = 'temperature';
  var lc = m.firstFrame || 0;
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

  function values(f) {
    var c = m.frames[f];
    return quantity === 'temperature' ? c.facetTemperatureK : c.facetNetFluxWPerM2;
  }
  function range() {
    return rangeOf(m.commonScale ? m.frames.map(function (c, f) { return values(f); }) : [values(lc)]);
  }
  function label() { return quantity === 'temperature' ? 'Temperature, K' : 'Net radiative flux, W/m² (positive: loses heat)'; }
  function fmt(v) { return quantity === 'temperature' ? temperature(v) : power(v); }
  var tmp = new THREE.Color();
  function paint(f, r) {
    var v = values(f);
    for (var t = 0; t < m.triangleFacet.length; t++) {
      var value = v[m.triangleFacet[t]];
      var rgb = value === null ? [0.75, 0.75, 0.75] : viridis((value - r[0]) / (r[1] - r[0]));
      tmp.setRGB(rgb[0], rgb[1], rgb[2], THREE.SRGBColorSpace);
      for (var k = 0; k < 3; k++) {
        colours[9 * t + 3 * k] = tmp.r; colours[9 * t + 3 * k + 1] = tmp.g; colours[9 * t + 3 * k + 2] = tmp.b;
      }
    }
    geom.attributes.color.needsUpdate = true;
  }
  var stillsOf = null;
  function colour() {
    var r = range();
    var key = quantity + (m.stillFrames ? '' : ' ' + lc);
    if (key !== stillsOf) { stills(r); stillsOf = key; }
    paint(lc, r);
    bar(document.getElementById('colorbar'), r, 12);
    document.getElementById('colorbar-label').textContent = label() + ', ' + m.frameKind.toLowerCase() + ' ' + m.frames[lc].name;
    render();
  }
  function bar(el, r, px) { drawBar(el, r, px, fmt, quantity === 'temperature' ? 'T, K' : 'q, W/m²'); }
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
    var legend = document.createElement('canvas'); legend.width = 150; legend.height = 440;
    bar(legend, r, 17);
    holder.innerHTML = '';
    var shots = m.stillFrames ? m.stillFrames.map(function (f) { return { view: VIEWS[0], frame: f }; })
      : VIEWS.map(function (v) { return { view: v, frame: lc }; });
    shots.forEach(function (shot) {
      var view = shot.view;
      paint(shot.frame, r);
      place(cam, view.dir, view.up);
      stillRenderer.render(scene, cam);
      var sheet = document.createElement('canvas'); sheet.width = 670; sheet.height = 440;
      var g = sheet.getContext('2d');
      g.drawImage(stillRenderer.domElement, 0, 0);
      g.drawImage(legend, 520, 0);
      var fig = document.createElement('figure');
      var img = document.createElement('img');
      img.alt = view.name + ', coloured by ' + label().toLowerCase() + ', ' + m.frames[shot.frame].name;
      img.src = sheet.toDataURL('image/png');
      var cap = document.createElement('figcaption');
      cap.textContent = view.name + ' — ' + label() + ' (' + m.frames[shot.frame].name + ')';
      fig.appendChild(img); fig.appendChild(cap); holder.appendChild(fig);
    });
    state.stills = shots.length;
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
  var picked = -1;
  function show(facet) {
    picked = facet;
    var s = m.facetSurface[facet], c = m.frames[lc], sv = c.surfaces[s];
    var rows = sv.solved ? [['Surface', m.surfaces[s]], [m.frameKind, c.name], ['Temperature, K', temperature(sv.temperatureK)],
      ['Net heat, W', power(sv.netHeatW)], ['Net flux, W/m²', power(sv.netFluxWPerM2)], ['Area, m²', sv.areaM2.toPrecision(5)]]
      : [['Surface', m.surfaces[s]], [m.frameKind, c.name], ['Result', 'none for this surface (drawn grey)']];
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
  return { setFrame: function (f) { lc = f; colour(); if (picked >= 0) { show(picked); } } };
}
