// Time plots over a chosen window, drawn with uPlot (served from the tool).
"use strict";
const Plots = (() => {
  function make(container, specs) {
    const data = { t: [] };
    for (const s of specs) for (const line of s.lines) data[line.key] = [];
    const charts = specs.map((s) => {
      const box = Console_.el("div", {});
      container.append(box);
      const opts = {
        title: s.title, width: 440, height: 190,
        scales: { x: { time: false } },
        axes: [{ label: "day" }, { label: s.unit, size: 64 }],
        series: [{ label: "day", value: (u, v) => v === null ? "—" : v.toFixed(3) }, ...s.lines.map((l) => ({ label: l.label, stroke: l.colour, width: 1.6, value: (u, v) => v === null ? "—" : v.toPrecision(4) }))],
      };
      return new uPlot(opts, [[], ...s.lines.map(() => [])], box);
    });
    let windowS = 86400;
    function add(tS, values) {
      data.t.push(tS / 86400);
      for (const s of specs) for (const line of s.lines) {
        const v = values[line.key];
        data[line.key].push(v === undefined || v === null ? null : v * (line.scale || 1));
      }
    }
    function draw() {
      const n = data.t.length;
      if (!n) return;
      const last = data.t[n - 1];
      let from = 0;
      if (windowS > 0) { const cut = last - windowS / 86400; while (from < n && data.t[from] < cut) from++; }
      const xs = data.t.slice(from);
      specs.forEach((s, i) => charts[i].setData([xs, ...s.lines.map((l) => data[l.key].slice(from))]));
    }
    return { add, draw, setWindow: (s) => { windowS = s; draw(); } };
  }
  return { make };
})();
