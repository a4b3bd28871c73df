using System.Text;

namespace PartForge.Export.Report;

/// <summary>
/// The report's interactive 3D view: a canvas, its controls and the project's own WebGL 2 code (no library,
/// nothing fetched). Drag to orbit, right-drag or shift-drag to pan, wheel to zoom; a checkbox per part, an
/// explode slider (each copy moves along the axis by its explode rank, the stack order), and a check picker that
/// colours the check's part and counterpart and marks the place between them. The scene data comes from
/// <see cref="ViewerScene"/>. Without WebGL 2 the view says so and the PNG previews remain.
/// </summary>
public static class Viewer3d
{
    public static void Append(StringBuilder sb, string sceneJson)
    {
        sb.Append("<section id=\"view3d\"><h2>3D view</h2>\n<p class=\"note\">Drag to turn, right-drag or shift-drag to pan, wheel to zoom. The explode slider moves the parts apart along the axis in stack order. A chosen check colours its part red and its counterpart orange and marks the place between them with a cross.</p>\n")
          .Append("<div class=\"view3d-controls\"><label>explode <input type=\"range\" id=\"pf-explode\" min=\"0\" max=\"1.5\" step=\"0.05\" value=\"0\"> <span id=\"pf-explode-mm\">0 mm</span></label> ")
          .Append("<label>check <select id=\"pf-check\"><option value=\"-1\">none</option></select></label> <button type=\"button\" id=\"pf-reset\">reset view</button>")
          .Append("<div id=\"pf-parts\"></div></div>\n")
          .Append("<canvas id=\"pf-view\" width=\"960\" height=\"600\"></canvas><p id=\"pf-view-msg\" class=\"note\"></p>\n")
          .Append("<script type=\"application/json\" id=\"pf-scene\">").Append(sceneJson).Append("</script>\n<script>\n").Append(Script).Append("</script>\n</section>\n");
    }

    /// <summary>The viewer's code. Plain ES2017 and WebGL 2; no globals but <c>window.pfView</c> (for tests and
    /// the live page: <c>pfView.state()</c>, <c>pfView.setExplode(t)</c>).</summary>
    public const string Script = """
(function () {
  'use strict';
  var S = JSON.parse(document.getElementById('pf-scene').textContent);
  var cv = document.getElementById('pf-view'), msg = document.getElementById('pf-view-msg');
  var gl = cv.getContext('webgl2', { preserveDrawingBuffer: true, antialias: true });
  if (!gl) { msg.textContent = 'This browser offers no WebGL 2, so the 3D view is off; the previews below show the parts.'; return; }
  function bytes(s) { var b = atob(s), u = new Uint8Array(b.length); for (var i = 0; i < b.length; i++) u[i] = b.charCodeAt(i); return u; }
  function sh(type, src) { var s = gl.createShader(type); gl.shaderSource(s, src); gl.compileShader(s); if (!gl.getShaderParameter(s, gl.COMPILE_STATUS)) throw new Error(gl.getShaderInfoLog(s)); return s; }
  function prog(v, f) { var p = gl.createProgram(); gl.attachShader(p, sh(gl.VERTEX_SHADER, v)); gl.attachShader(p, sh(gl.FRAGMENT_SHADER, f)); gl.linkProgram(p); if (!gl.getProgramParameter(p, gl.LINK_STATUS)) throw new Error(gl.getProgramInfoLog(p)); return p; }
  var P = prog('#version 300 es\nin vec3 q;uniform vec3 lo,st;uniform mat4 M,VP;uniform float dz;out vec3 wp;void main(){vec4 w=M*vec4(lo+q*st,1.0);w.z+=dz;wp=w.xyz;gl_Position=VP*w;}',
    '#version 300 es\nprecision highp float;in vec3 wp;uniform vec3 col,eye;out vec4 o;void main(){vec3 n=normalize(cross(dFdx(wp),dFdy(wp)));vec3 v=normalize(eye-wp);if(dot(n,v)<0.0)n=-n;vec3 l=normalize(v+vec3(0.3,0.2,0.6));float d=0.28+0.55*max(dot(n,l),0.0)+0.17*max(dot(n,v),0.0);o=vec4(col*d,1.0);}');
  var L = prog('#version 300 es\nin vec3 p;uniform mat4 VP;void main(){gl_Position=VP*vec4(p,1.0);}',
    '#version 300 es\nprecision highp float;uniform vec3 col;out vec4 o;void main(){o=vec4(col,1.0);}');
  var u = {}; ['lo', 'st', 'M', 'VP', 'dz', 'col', 'eye'].forEach(function (n) { u[n] = gl.getUniformLocation(P, n); });
  var lu = { VP: gl.getUniformLocation(L, 'VP'), col: gl.getUniformLocation(L, 'col') };
  var lo3 = [1e30, 1e30, 1e30], hi3 = [-1e30, -1e30, -1e30];
  var parts = S.parts.map(function (p) {
    var vao = gl.createVertexArray(); gl.bindVertexArray(vao);
    var pb = gl.createBuffer(); gl.bindBuffer(gl.ARRAY_BUFFER, pb); gl.bufferData(gl.ARRAY_BUFFER, bytes(p.pos), gl.STATIC_DRAW);
    var qa = gl.getAttribLocation(P, 'q'); gl.enableVertexAttribArray(qa); gl.vertexAttribPointer(qa, 3, gl.UNSIGNED_SHORT, false, 0, 0);
    var ib = gl.createBuffer(), ix = bytes(p.idx); gl.bindBuffer(gl.ELEMENT_ARRAY_BUFFER, ib); gl.bufferData(gl.ELEMENT_ARRAY_BUFFER, ix, gl.STATIC_DRAW);
    gl.bindVertexArray(null);
    var hi = [p.lo[0] + 65535 * p.step[0], p.lo[1] + 65535 * p.step[1], p.lo[2] + 65535 * p.step[2]], r = 0, zr = [1e30, -1e30];
    p.copies.forEach(function (c) {
      for (var k = 0; k < 8; k++) {
        var x = k & 1 ? hi[0] : p.lo[0], y = k & 2 ? hi[1] : p.lo[1], z = k & 4 ? hi[2] : p.lo[2], m = c.m;
        var w = [m[0] * x + m[4] * y + m[8] * z + m[12], m[1] * x + m[5] * y + m[9] * z + m[13], m[2] * x + m[6] * y + m[10] * z + m[14]];
        for (var j = 0; j < 3; j++) { lo3[j] = Math.min(lo3[j], w[j]); hi3[j] = Math.max(hi3[j], w[j]); }
        r = Math.max(r, Math.hypot(w[0], w[1])); zr[0] = Math.min(zr[0], w[2]); zr[1] = Math.max(zr[1], w[2]);
      }
    });
    return { name: p.name, colour: p.colour, copies: p.copies, vao: vao, count: ix.length / (p.wide ? 4 : 2), type: p.wide ? gl.UNSIGNED_INT : gl.UNSIGNED_SHORT, lo: p.lo, st: p.step, shown: true, radius: r, z: zr, rank: p.copies[0].rank };
  });
  var size = Math.max(hi3[0] - lo3[0], hi3[1] - lo3[1], hi3[2] - lo3[2], 1);
  var explodeMm = S.explodeMm > 0 ? S.explodeMm : 0.25 * size;
  var centre = [(lo3[0] + hi3[0]) / 2, (lo3[1] + hi3[1]) / 2, (lo3[2] + hi3[2]) / 2];
  var cam, explode = 0, chosen = -1;
  function home() { cam = { az: -1.05, el: 0.45, dist: 1.7 * size, target: centre.slice() }; }
  home();
  var box = document.getElementById('pf-parts');
  parts.forEach(function (p, i) {
    var l = document.createElement('label'), c = document.createElement('input');
    c.type = 'checkbox'; c.checked = true; c.dataset.part = p.name;
    c.addEventListener('change', function () { p.shown = c.checked; draw(); });
    l.appendChild(c); l.appendChild(document.createTextNode(' ' + p.name + ' ')); box.appendChild(l);
  });
  var sel = document.getElementById('pf-check');
  S.checks.forEach(function (c, i) {
    var o = document.createElement('option'); o.value = String(i);
    o.textContent = c.status + ': ' + c.id + ' - ' + c.part + (c.counterpart ? ' / ' + c.counterpart : '') + (c.where ? ' (' + c.where + ')' : '');
    sel.appendChild(o);
  });
  for (var i = 0; i < S.checks.length; i++) if (S.checks[i].status === 'fail') { chosen = i; break; }
  sel.value = String(chosen);
  sel.addEventListener('change', function () { chosen = +sel.value; draw(); });
  document.querySelectorAll('#check-table tr[data-check]').forEach(function (tr) {
    tr.addEventListener('click', function () {
      for (var i = 0; i < S.checks.length; i++) {
        var c = S.checks[i];
        if (c.id === tr.dataset.check && c.part === tr.dataset.part && (c.counterpart || '') === (tr.dataset.counterpart || '')) { chosen = i; sel.value = String(i); draw(); cv.scrollIntoView({ block: 'center' }); }
      }
    });
  });
  var slider = document.getElementById('pf-explode'), mmText = document.getElementById('pf-explode-mm');
  function setExplode(t) { explode = +t; slider.value = String(t); mmText.textContent = (explode * explodeMm).toFixed(1) + ' mm per step'; draw(); }
  slider.addEventListener('input', function () { setExplode(slider.value); });
  document.getElementById('pf-reset').addEventListener('click', function () { home(); draw(); });
  function mul(a, b) { var o = new Array(16); for (var c = 0; c < 4; c++) for (var r = 0; r < 4; r++) { var s = 0; for (var k = 0; k < 4; k++) s += a[k * 4 + r] * b[c * 4 + k]; o[c * 4 + r] = s; } return o; }
  function eyePos() { var ce = Math.cos(cam.el); return [cam.target[0] + cam.dist * ce * Math.cos(cam.az), cam.target[1] + cam.dist * ce * Math.sin(cam.az), cam.target[2] + cam.dist * Math.sin(cam.el)]; }
  function basis() {
    var e = eyePos(), f = [cam.target[0] - e[0], cam.target[1] - e[1], cam.target[2] - e[2]], fl = Math.hypot(f[0], f[1], f[2]);
    f = [f[0] / fl, f[1] / fl, f[2] / fl];
    var s = [f[1], -f[0], 0], sl = Math.hypot(s[0], s[1]) || 1; s = [s[0] / sl, s[1] / sl, 0];
    var up = [s[1] * f[2] - s[2] * f[1], s[2] * f[0] - s[0] * f[2], s[0] * f[1] - s[1] * f[0]];
    return { e: e, f: f, s: s, u: up };
  }
  function viewProj() {
    var b = basis(), e = b.e, f = b.f, s = b.s, up = b.u;
    var V = [s[0], up[0], -f[0], 0, s[1], up[1], -f[1], 0, s[2], up[2], -f[2], 0,
      -(s[0] * e[0] + s[1] * e[1] + s[2] * e[2]), -(up[0] * e[0] + up[1] * e[1] + up[2] * e[2]), f[0] * e[0] + f[1] * e[1] + f[2] * e[2], 1];
    var n = Math.max(cam.dist - 2 * size, cam.dist * 0.02), fa = cam.dist + 3 * size, t = 1 / Math.tan(0.35), a = cv.width / cv.height;
    var Pm = [t / a, 0, 0, 0, 0, t, 0, 0, 0, 0, (fa + n) / (n - fa), -1, 0, 0, 2 * fa * n / (n - fa), 0];
    return mul(Pm, V);
  }
  function marker(c) {
    var p = parts.filter(function (x) { return x.name === c.part; })[0]; if (!p) return null;
    var q = c.counterpart ? parts.filter(function (x) { return x.name === c.counterpart; })[0] : null;
    var pz = [p.z[0] + p.rank * explode * explodeMm, p.z[1] + p.rank * explode * explodeMm], z, r;
    if (q) {
      var qz = [q.z[0] + q.rank * explode * explodeMm, q.z[1] + q.rank * explode * explodeMm];
      z = pz[1] <= qz[0] ? (pz[1] + qz[0]) / 2 : qz[1] <= pz[0] ? (qz[1] + pz[0]) / 2 : (Math.max(pz[0], qz[0]) + Math.min(pz[1], qz[1])) / 2;
      r = Math.min(p.radius, q.radius);
    } else { z = pz[1]; r = p.radius; }
    var a = (c.angleDeg || 0) * Math.PI / 180;
    return [r * Math.cos(a), r * Math.sin(a), z];
  }
  var lineBuf = gl.createBuffer(), lineVao = gl.createVertexArray();
  gl.bindVertexArray(lineVao); gl.bindBuffer(gl.ARRAY_BUFFER, lineBuf);
  var pa = gl.getAttribLocation(L, 'p'); gl.enableVertexAttribArray(pa); gl.vertexAttribPointer(pa, 3, gl.FLOAT, false, 0, 0); gl.bindVertexArray(null);
  function draw() {
    var w = cv.clientWidth || cv.width, h = Math.round(w * 0.625);
    if (cv.width !== w || cv.height !== h) { cv.width = w; cv.height = h; }
    gl.viewport(0, 0, cv.width, cv.height);
    gl.clearColor(0.965, 0.96, 0.95, 1); gl.clear(gl.COLOR_BUFFER_BIT | gl.DEPTH_BUFFER_BIT); gl.enable(gl.DEPTH_TEST);
    var VP = viewProj(), e = eyePos(), c = chosen >= 0 ? S.checks[chosen] : null;
    gl.useProgram(P); gl.uniformMatrix4fv(u.VP, false, VP); gl.uniform3fv(u.eye, e);
    parts.forEach(function (p) {
      if (!p.shown) return;
      var col = p.colour;
      if (c) col = p.name === c.part ? [0.86, 0.12, 0.1] : p.name === c.counterpart ? [0.95, 0.55, 0.05] : [0.5 + 0.3 * col[0], 0.5 + 0.3 * col[1], 0.5 + 0.3 * col[2]];
      gl.uniform3fv(u.col, col); gl.uniform3fv(u.lo, p.lo); gl.uniform3fv(u.st, p.st); gl.bindVertexArray(p.vao);
      p.copies.forEach(function (k) { gl.uniformMatrix4fv(u.M, false, k.m); gl.uniform1f(u.dz, k.rank * explode * explodeMm); gl.drawElements(gl.TRIANGLES, p.count, p.type, 0); });
    });
    var m = c ? marker(c) : null;
    if (m) {
      var d = 0.06 * size, v = new Float32Array([m[0] - d, m[1], m[2], m[0] + d, m[1], m[2], m[0], m[1] - d, m[2], m[0], m[1] + d, m[2], m[0], m[1], m[2] - d, m[0], m[1], m[2] + d]);
      gl.disable(gl.DEPTH_TEST); gl.useProgram(L); gl.uniformMatrix4fv(lu.VP, false, VP); gl.uniform3fv(lu.col, [0.1, 0.1, 0.9]);
      gl.bindVertexArray(lineVao); gl.bindBuffer(gl.ARRAY_BUFFER, lineBuf); gl.bufferData(gl.ARRAY_BUFFER, v, gl.DYNAMIC_DRAW); gl.drawArrays(gl.LINES, 0, 6);
    }
    gl.bindVertexArray(null);
    msg.textContent = c ? 'Marked: ' + c.id + ' on ' + c.part + (c.counterpart ? ' against ' + c.counterpart : '') + (c.where ? ' at ' + c.where : '') + '.' : '';
  }
  var drag = null;
  cv.addEventListener('contextmenu', function (ev) { ev.preventDefault(); });
  cv.addEventListener('pointerdown', function (ev) { drag = { x: ev.clientX, y: ev.clientY, pan: ev.button === 2 || ev.shiftKey }; cv.setPointerCapture(ev.pointerId); });
  cv.addEventListener('pointerup', function () { drag = null; });
  cv.addEventListener('pointermove', function (ev) {
    if (!drag) return;
    var dx = ev.clientX - drag.x, dy = ev.clientY - drag.y; drag.x = ev.clientX; drag.y = ev.clientY;
    if (drag.pan) {
      var b = basis(), k = cam.dist * 0.0015;
      for (var j = 0; j < 3; j++) cam.target[j] += (-dx * b.s[j] + dy * b.u[j]) * k;
    } else { cam.az -= dx * 0.008; cam.el = Math.max(-1.5, Math.min(1.5, cam.el + dy * 0.008)); }
    draw();
  });
  cv.addEventListener('wheel', function (ev) { ev.preventDefault(); cam.dist = Math.max(0.1 * size, Math.min(20 * size, cam.dist * Math.exp(ev.deltaY * 0.001))); draw(); }, { passive: false });
  window.addEventListener('resize', draw);
  window.pfView = {
    setExplode: setExplode,
    state: function () { return { az: cam.az, el: cam.el, dist: cam.dist, target: cam.target.slice(), explode: explode, chosen: chosen, hidden: parts.filter(function (p) { return !p.shown; }).map(function (p) { return p.name; }) }; },
    restore: function (s) { cam = { az: s.az, el: s.el, dist: s.dist, target: s.target }; chosen = s.chosen < S.checks.length ? s.chosen : -1; sel.value = String(chosen); parts.forEach(function (p) { p.shown = s.hidden.indexOf(p.name) < 0; }); document.querySelectorAll('#pf-parts input').forEach(function (c) { c.checked = s.hidden.indexOf(c.dataset.part) < 0; }); setExplode(s.explode); },
    draw: draw
  };
  setExplode(0);
})();
""";
}
