"use strict";
(async () => {
  const C = Console_;
  const info = await C.session("team");
  document.getElementById("scenario").textContent = info.scenario;
  const words = document.getElementById("command-words");
  for (const w of info.commands) words.append(C.el("option", { value: w }));
  const plots = Plots.make(document.getElementById("plots"), [
    { title: "Depth", unit: "m", lines: [{ key: "probe.depth", label: "depth", colour: "#1f6f6a" }] },
    { title: "Descent rate", unit: "m/h", lines: [{ key: "probe.velocity", label: "rate", colour: "#b4631a", scale: 3600 }] },
    { title: "Heater power", unit: "kW", lines: [{ key: "probe.head_power", label: "head", colour: "#23211d", scale: 0.001 }, { key: "probe.wall_power", label: "wall", colour: "#7a5fa0", scale: 0.001 }] },
    { title: "Battery and buffer", unit: "share", lines: [{ key: "probe.battery_soc", label: "battery", colour: "#2d6a2f" }, { key: "probe.buffer_fill", label: "buffer", colour: "#9b2c2c" }] },
  ]);
  document.getElementById("window").addEventListener("change", (e) => plots.setWindow(Number(e.target.value)));
  let frames = 0, lastFrame = null, dirty = false;
  const events = document.getElementById("events");
  const progress = document.querySelector("#progress tbody");
  function showFrame(f) {
    const table = document.getElementById("latest");
    table.dataset.arrived = f.t; table.dataset.sampled = f.sampled;
    const body = document.querySelector("#latest tbody");
    body.replaceChildren(C.el("tr", {}, C.el("td", {}, "regime"), C.el("td", { class: "num", "data-point": "probe.regime" }, f.regime)));
    for (const [k, v] of Object.entries(f.values)) body.append(C.el("tr", {}, C.el("td", {}, k), C.el("td", { class: "num", "data-point": k, "data-value": v === null ? "" : String(v) }, C.value(k, v))));
    const limits = document.querySelector("#limits tbody");
    limits.replaceChildren(...f.limits.map((l) => C.el("tr", {}, C.el("td", {}, l.rule + " (" + l.placement + ")"), C.el("td", {}, l.check),
      C.el("td", { class: l.crossed === null ? "" : l.crossed ? "crossed" : "within" }, l.crossed === null ? "no reading" : l.crossed ? "crossed" : "within"))));
  }
  function commandRow(n, command) {
    let row = progress.querySelector('tr[data-number="' + n + '"]');
    if (!row) {
      row = C.el("tr", { "data-number": String(n) }, C.el("td", {}, String(n)), C.el("td", { class: "cmd" }, command || ""), C.el("td", { class: "status" }, ""));
      progress.prepend(row);
    }
    return row;
  }
  // One row per procedure: its current step, what became of it, the evidence, when it is late, and the answer buttons.
  const procedures = document.querySelector("#procedures tbody");
  function showProcedure(p) {
    let row = procedures.querySelector('tr[data-procedure="' + p.procedure + '"]');
    if (!row) {
      row = C.el("tr", { "data-procedure": p.procedure }, C.el("td", {}, p.procedure), C.el("td", { class: "step" }), C.el("td", { class: "status" }),
        C.el("td", { class: "evidence" }), C.el("td", { class: "late" }), C.el("td", { class: "answer" }));
      procedures.append(row);
    }
    if (p.status === "answer ignored") { C.say("step-msg", "answer to " + p.step + " ignored: " + p.reason, false); return; }
    if (p.step) row.querySelector(".step").textContent = p.step;
    const status = row.querySelector(".status");
    status.textContent = p.status + (p.by ? " by " + p.by : "") + (p.outcome ? " (" + p.outcome + ")" : "") + " · " + C.time(p.at);
    status.setAttribute("data-status", p.status);
    if (p.evidence !== undefined) row.querySelector(".evidence").textContent = p.evidence;
    if (p.status === "running" || p.status === "waiting for confirmation") row.querySelector(".late").textContent = p.late_at === undefined ? "—" : C.time(p.late_at);
    const answer = row.querySelector(".answer");
    answer.replaceChildren();
    if (p.awaiting) {
      for (const [word, label] of [["confirm", "Confirm"], ["skip", "Skip"]]) {
        const b = C.el("button", { class: word === "skip" ? "quiet" : "", "data-answer": word }, label + (word === "confirm" && p.command ? ": " + p.command : ""));
        b.addEventListener("click", async () => {
          const r = await C.post("/api/steps", { procedure: p.procedure, step: p.step, answer: word, by: document.getElementById("answer-by").value });
          C.say("step-msg", r.status === 202 ? "answer " + r.number + " handed to the ground" : (r.error || "refused (" + r.status + ")"), r.status === 202);
          if (r.status === 202) answer.replaceChildren();
        });
        answer.append(b);
      }
    }
  }
  C.stream("team", (item) => {
    switch (item.type) {
      case "status":
        C.header(item);
        if (lastFrame) document.getElementById("frame-age").textContent = "sampled " + C.time(lastFrame.sampled) + ", arrived " + C.time(lastFrame.t) + " (" + C.span(lastFrame.t - lastFrame.sampled) + " on the way); " + C.span(item.t - lastFrame.t) + " ago";
        if (dirty) { plots.draw(); dirty = false; }
        break;
      case "frame":
        frames++; lastFrame = item;
        document.getElementById("frames-received").textContent = frames;
        plots.add(item.sampled, item.values);
        dirty = true;
        showFrame(item);
        break;
      case "event":
        C.logLine(events, item.at, item.source + " · " + item.kind + " · " + item.text + (item.learned > item.at ? " (learned " + C.time(item.learned) + ")" : ""), "sev-" + item.severity);
        break;
      case "procedure":
        showProcedure(item);
        break;
      case "command": {
        const row = commandRow(item.number, item.command);
        row.querySelector(".status").textContent = item.status + " (" + C.time(item.at) + (item.learned > item.at ? ", learned " + C.time(item.learned) : "") + ")";
        row.querySelector(".status").setAttribute("data-status", item.status);
        break;
      }
    }
  });
  document.getElementById("command-send").addEventListener("click", async () => {
    const text = document.getElementById("command-text").value;
    const r = await C.post("/api/commands", { text });
    if (r.status === 202) {
      C.say("command-msg", "accepted as command " + r.number + "; it goes up with the next tick", true);
      commandRow(r.number, text).querySelector(".status").textContent = "handed to the ground station";
    } else {
      C.say("command-msg", r.error || ("refused (" + r.status + ")"), false);
    }
  });
})();
