// Shared by both pages: the session token, the API, the stream and time formatting.
"use strict";
const Console_ = (() => {
  const token = new URLSearchParams(location.search).get("token") || "";
  async function post(path, body) {
    const r = await fetch(path, { method: "POST", headers: { "Content-Type": "application/json", "X-Session-Token": token }, body: JSON.stringify(body || {}) });
    let answer = {};
    try { answer = await r.json(); } catch (e) { answer = { error: "no answer" }; }
    return { status: r.status, ...answer };
  }
  async function session(view) {
    const r = await fetch("/api/session?view=" + view, { headers: { "X-Session-Token": token } });
    return r.json();
  }
  function stream(view, onItem) {
    const source = new EventSource("/api/stream?view=" + view + "&token=" + encodeURIComponent(token));
    source.onmessage = (e) => {
      const items = JSON.parse(e.data);
      for (const item of items) onItem(item);
      if (items.length && items[items.length - 1].ended) source.close();
    };
    return source;
  }
  function time(s) {
    if (s === null || s === undefined || !isFinite(s)) return "—";
    const d = Math.floor(s / 86400), rest = s - d * 86400;
    const h = Math.floor(rest / 3600), m = Math.floor((rest % 3600) / 60), sec = Math.floor(rest % 60);
    const p = (n) => String(n).padStart(2, "0");
    return "day " + d + " " + p(h) + ":" + p(m) + ":" + p(sec);
  }
  function span(s) {
    if (!isFinite(s)) return "—";
    if (Math.abs(s) < 120) return s.toFixed(0) + " s";
    if (Math.abs(s) < 7200) return (s / 60).toFixed(1) + " min";
    return (s / 3600).toFixed(2) + " h";
  }
  function el(tag, attrs, ...children) {
    const e = document.createElement(tag);
    for (const [k, v] of Object.entries(attrs || {})) { if (k === "class") e.className = v; else e.setAttribute(k, v); }
    for (const c of children) e.append(c instanceof Node ? c : document.createTextNode(String(c)));
    return e;
  }
  function say(id, text, good) {
    const m = document.getElementById(id);
    m.textContent = text;
    m.className = "msg " + (good ? "good" : "bad");
  }
  function logLine(box, at, text, cls) {
    const line = el("div", { class: cls || "" }, el("span", { class: "when" }, time(at)), text);
    box.prepend(line);
    while (box.childElementCount > 400) box.lastElementChild.remove();
  }
  const units = { depth_m: "m", "probe.depth": "m", velocity_m_s: "m/s", "probe.velocity": "m/s", "probe.ice_temperature": "K", ice_temperature_k: "K",
    "probe.head_power": "W", "probe.wall_power": "W", head_power_w: "W", wall_power_w: "W", "probe.energy_used": "J", energy_used_j: "J",
    "probe.tilt": "rad", tilt_rad: "rad", "probe.battery_soc": "share", "probe.bus_power_available": "W", "probe.buffer_fill": "share" };
  function value(name, v) {
    if (v === null || v === undefined) return "missing";
    const u = units[name] || "";
    const abs = Math.abs(v);
    const text = abs !== 0 && (abs < 0.01 || abs >= 1e6) ? v.toExponential(3) : v.toFixed(abs < 10 ? 4 : 1);
    return text + (u ? " " + u : "");
  }
  function header(status, sessionInfo) {
    document.getElementById("clock").textContent = time(status.t);
    document.getElementById("state").textContent = status.ended ? "session ended" : (status.paused ? "paused" : "running") + " at " + status.pace + " s per s";
  }
  return { token, post, session, stream, time, span, el, say, logLine, value, header };
})();
