// The turnable 3D gain surface on a canvas: drag with a mouse or a finger (or use the arrow keys)
// to turn it. Loaded only when the figure comes into view; until then, and without script, the page
// shows the static picture. The scene math is generator/render/pattern3dScene.ts.
import { levelColour, patternScene, RANGE_DB, type PatternGrid } from "../../generator/render/pattern3dScene";
import { PALETTE } from "../../generator/render/palette";

const START_YAW = (35 * Math.PI) / 180, START_PITCH = (35 * Math.PI) / 180;
const RAD_PER_PX = Math.PI / 260;
const FONT = "12px Inter, system-ui, sans-serif";

export async function mountPattern3d(figure: HTMLElement, gridUrl: string): Promise<void> {
  const grid = (await (await fetch(gridUrl)).json()) as PatternGrid;
  const img = figure.querySelector("img");
  const canvas = document.createElement("canvas");
  canvas.className = "turnable";
  canvas.tabIndex = 0;
  canvas.setAttribute("role", "img");
  canvas.setAttribute("aria-label", "Three-dimensional gain surface; drag or use the arrow keys to turn it");
  const hint = document.createElement("p");
  hint.className = "small muted turn-hint";
  hint.textContent = "Drag (or use the arrow keys) to turn the surface. Colour and distance from the centre grow with gain.";
  let yaw = START_YAW, pitch = START_PITCH, frame = 0;

  const draw = () => {
    const cssW = Math.max(200, Math.round(figure.clientWidth - 16));
    const cssH = Math.round(cssW * 0.95);
    const dpr = window.devicePixelRatio || 1;
    if (canvas.width !== Math.round(cssW * dpr)) {
      canvas.width = Math.round(cssW * dpr);
      canvas.height = Math.round(cssH * dpr);
      canvas.style.width = `${cssW}px`;
      canvas.style.height = `${cssH}px`;
    }
    const ctx = canvas.getContext("2d")!;
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.fillStyle = PALETTE.paper;
    ctx.fillRect(0, 0, cssW, cssH);
    const scene = patternScene(grid, yaw, pitch);
    const R = cssW * 0.36, cx = cssW / 2, cy = cssH * 0.47;
    const at = (p: [number, number]): [number, number] => [cx + R * p[0], cy - R * p[1]];
    const axis = (a: Scene["axes"][number], front: boolean) => {
      if (a.front !== front) return;
      const o = at([0, 0]), e = at(a.end);
      ctx.strokeStyle = PALETTE.ink;
      ctx.globalAlpha = front ? 0.9 : 0.45;
      ctx.lineWidth = 1.4;
      ctx.beginPath(); ctx.moveTo(o[0], o[1]); ctx.lineTo(e[0], e[1]); ctx.stroke();
      ctx.globalAlpha = 1;
      ctx.fillStyle = PALETTE.ink;
      ctx.font = `italic 14px Inter, system-ui, sans-serif`;
      ctx.fillText(a.label, e[0] + 4, e[1] - 4);
    };
    scene.axes.forEach((a) => axis(a, false));
    ctx.lineJoin = "round";
    ctx.lineWidth = 0.6;
    ctx.strokeStyle = "rgba(36, 49, 58, 0.16)";
    for (const f of scene.faces) {
      ctx.beginPath();
      f.pts.forEach((p, i) => { const q = at(p); if (i === 0) ctx.moveTo(q[0], q[1]); else ctx.lineTo(q[0], q[1]); });
      ctx.closePath();
      ctx.fillStyle = f.fill;
      ctx.fill();
      ctx.stroke();
    }
    scene.axes.forEach((a) => axis(a, true));
    const wire = scene.wire.map(at);
    for (const [w, c] of [[6, PALETTE.paper], [3.2, PALETTE.wire]] as const) {
      ctx.lineWidth = w; ctx.strokeStyle = c; ctx.lineCap = "round";
      ctx.beginPath(); wire.forEach((q, i) => (i === 0 ? ctx.moveTo(q[0], q[1]) : ctx.lineTo(q[0], q[1]))); ctx.stroke();
    }
    // colour key, text at 12 px
    ctx.font = FONT;
    const dbi = (v: number) => `${v < 0 ? "\u2212" : ""}${Math.abs(v).toFixed(1)} dBi`;
    const keyY = cssH - 18, step = Math.min(120, (cssW - 24) / 4);
    [0, 10, 20, 30].forEach((db, i) => {
      const x = 12 + i * step;
      ctx.fillStyle = levelColour(db / RANGE_DB);
      ctx.fillRect(x, keyY - 10, 14, 12);
      ctx.fillStyle = PALETTE.ink;
      ctx.fillText(db === 30 ? `${dbi(scene.floorDbi + db)} peak` : dbi(scene.floorDbi + db), x + 18, keyY);
    });
    frame += 1;
    canvas.dataset.frame = String(frame);
    canvas.dataset.yawDeg = ((yaw * 180) / Math.PI).toFixed(1);
    canvas.dataset.pitchDeg = ((pitch * 180) / Math.PI).toFixed(1);
  };
  type Scene = ReturnType<typeof patternScene>;

  let last: { x: number; y: number } | null = null;
  let pending = 0;
  const redraw = () => { cancelAnimationFrame(pending); pending = requestAnimationFrame(draw); };
  canvas.addEventListener("pointerdown", (ev) => { last = { x: ev.clientX, y: ev.clientY }; canvas.setPointerCapture(ev.pointerId); ev.preventDefault(); });
  canvas.addEventListener("pointermove", (ev) => {
    if (!last) return;
    yaw -= (ev.clientX - last.x) * RAD_PER_PX;
    pitch = Math.max(-1.48, Math.min(1.48, pitch + (ev.clientY - last.y) * RAD_PER_PX));
    last = { x: ev.clientX, y: ev.clientY };
    redraw();
  });
  const end = () => { last = null; };
  canvas.addEventListener("pointerup", end);
  canvas.addEventListener("pointercancel", end);
  canvas.addEventListener("keydown", (ev) => {
    const d = Math.PI / 36;
    if (ev.key === "ArrowLeft") yaw += d; else if (ev.key === "ArrowRight") yaw -= d;
    else if (ev.key === "ArrowUp") pitch = Math.min(1.48, pitch + d); else if (ev.key === "ArrowDown") pitch = Math.max(-1.48, pitch - d);
    else return;
    ev.preventDefault();
    redraw();
  });
  new ResizeObserver(redraw).observe(figure);
  if (img) img.style.display = "none";
  figure.prepend(canvas, hint);
  draw();
  figure.dataset.turnable = "ready";
}
