"use strict";
(async () => {
  const C = Console_;
  const info = await C.session("supervisor");
  document.getElementById("scenario").textContent = info.scenario;
  document.getElementById("pace").value = info.pace;
  const kinds = info.fault_kinds;
  const kindSelect = document.getElementById("fault-kind");
  for (const k of kinds) kindSelect.append(C.el("option", { value: k.kind }, k.kind));
  let counter = 1;
  function fields() {
    const k = kinds.find((x) => x.kind === kindSelect.value);
    document.getElementById("fault-does").textContent = k.does;
    document.getElementById("fault-name").value = "console-" + k.kind.replace(/_/g, "-") + "-" + counter;
    const box = document.getElementById("fault-fields");
    box.replaceChildren();
    for (const f of k.fields) {
      box.append(C.el("label", { for: "ff-" + f.field }, f.field + " (" + f.means + ")"));
      let input;
      if (f.field === "point") { input = C.el("select", {}); for (const p of info.points) input.append(C.el("option", { value: p }, p)); }
      else if (f.field === "vehicle") { input = C.el("select", {}); for (const v of info.vehicles) input.append(C.el("option", { value: v }, v)); }
      else input = C.el("input", { type: "text", value: f.example, spellcheck: "false" });
      input.id = "ff-" + f.field;
      input.dataset.field = f.field;
      box.append(input);
    }
  }
  kindSelect.addEventListener("change", fields);
  fields();
  document.getElementById("fault-inject").addEventListener("click", async () => {
    const body = { name: document.getElementById("fault-name").value, kind: kindSelect.value };
    for (const input of document.querySelectorAll("#fault-fields [data-field]")) {
      const v = input.value.trim();
      if (v === "") continue;
      body[input.dataset.field] = input.dataset.field === "remaining_fraction" ? Number(v) : v;
    }
    const start = document.getElementById("fault-start").value;
    if (start !== "now") body[start] = document.getElementById("fault-when").value;
    const r = await C.post("/api/faults", body);
    if (r.status === 202) { C.say("fault-msg", "accepted as input " + r.number, true); counter++; fields(); }
    else C.say("fault-msg", r.error || "refused", false);
  });
  const scheduled = document.querySelector("#scheduled tbody");
  for (const f of info.scheduled_faults) scheduled.append(C.el("tr", {}, C.el("td", {}, f.name), C.el("td", {}, f.kind), C.el("td", {}, f.starts), C.el("td", {}, f.duration_s === null ? "for good" : C.span(f.duration_s))));
  if (!info.scheduled_faults.length) scheduled.append(C.el("tr", {}, C.el("td", {}, "none")));

  const active = new Set(info.active_faults);
  function showActive() {
    const body = document.querySelector("#active tbody");
    body.replaceChildren();
    for (const name of active) {
      const b = C.el("button", { class: "quiet" }, "Clear");
      b.addEventListener("click", async () => { const r = await C.post("/api/faults", { clear: name }); C.say("fault-msg", r.status === 202 ? "clearing " + name : r.error, r.status === 202); });
      body.append(C.el("tr", { "data-fault": name }, C.el("td", {}, name), C.el("td", {}, b)));
    }
    if (!active.size) body.append(C.el("tr", {}, C.el("td", {}, "none")));
  }
  showActive();

  async function clock(body, what) { const r = await C.post("/api/pace", body); C.say("clock-msg", r.status === 202 ? what : r.error, r.status === 202); }
  document.getElementById("pace-set").addEventListener("click", () => clock({ pace: Number(document.getElementById("pace").value) }, "pace changed"));
  document.getElementById("pause").addEventListener("click", () => clock({ paused: true }, "paused"));
  document.getElementById("resume").addEventListener("click", () => clock({ paused: false }, "running"));
  document.getElementById("end").addEventListener("click", async () => { const r = await C.post("/api/end", {}); C.say("clock-msg", r.status === 202 ? "ending the session…" : r.error, r.status === 202); });
  document.getElementById("mark-add").addEventListener("click", async () => {
    const note = document.getElementById("mark-note");
    const r = await C.post("/api/marks", { note: note.value });
    C.say("clock-msg", r.status === 202 ? "marked" : r.error, r.status === 202);
    if (r.status === 202) note.value = "";
  });

  const pairs = [["depth", "depth_m", "probe.depth"], ["descent rate", "velocity_m_s", "probe.velocity"], ["ice temperature", "ice_temperature_k", "probe.ice_temperature"],
    ["head power", "head_power_w", "probe.head_power"], ["wall power", "wall_power_w", "probe.wall_power"], ["energy used", "energy_used_j", "probe.energy_used"], ["tilt", "tilt_rad", "probe.tilt"]];
  const compare = document.querySelector("#compare tbody");
  const cells = {};
  for (const [label, truth, ground] of pairs) {
    const t = C.el("td", { class: "num", "data-true": ground }, "—"), g = C.el("td", { class: "num", "data-ground": ground }, "—");
    cells[ground] = { t, g, truth };
    compare.append(C.el("tr", {}, C.el("td", {}, label), t, g));
  }
  const regime = { t: C.el("td", { class: "num" }, "—"), g: C.el("td", { class: "num" }, "—") };
  compare.append(C.el("tr", {}, C.el("td", {}, "regime"), regime.t, regime.g));
  let truthAt = null, groundAt = null;
  const events = document.getElementById("events");
  C.stream("supervisor", (item) => {
    switch (item.type) {
      case "status":
        C.header(item);
        document.getElementById("compare-note").textContent = "truth sampled " + C.time(truthAt) + "; the ground's latest frame was sampled " + C.time(groundAt);
        break;
      case "truth":
        truthAt = item.t; regime.t.textContent = item.regime;
        for (const [ground, c] of Object.entries(cells)) { const v = item.values[c.truth]; c.t.textContent = C.value(ground, v); c.t.dataset.value = v; }
        break;
      case "frame":
        groundAt = item.sampled; regime.g.textContent = item.regime;
        for (const [ground, c] of Object.entries(cells)) { const v = item.values[ground]; c.g.textContent = C.value(ground, v); c.g.dataset.value = v === null || v === undefined ? "" : v; }
        break;
      case "truth-event":
        C.logLine(events, item.at, item.source + " · " + item.kind + " · " + item.text, "sev-" + item.severity);
        if (item.kind === "fault.injected") { active.add(/fault=([^,]*)/.exec(item.text)[1]); showActive(); }
        if (item.kind === "fault.cleared") { active.delete(/fault=([^,]*)/.exec(item.text)[1]); showActive(); }
        break;
      case "mark":
        C.logLine(document.getElementById("marks"), item.t, item.text);
        break;
      case "ended":
        document.getElementById("outcome").textContent = item.text;
        break;
    }
  });
})();
