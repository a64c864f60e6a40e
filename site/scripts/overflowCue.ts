// Marks every table wrapper and figure whose content is wider than its box (data-overflow) and puts
// a "swipe sideways" cue under it, so a phone user knows the rest of a table or drawing is there.
// Without script the wrappers' edge shadows still show it. Re-checked when the window resizes.
const CUE_TEXT = { table: "Swipe sideways for the other columns.", figure: "Drawn at full size so every label stays readable: swipe sideways to see all of it." };

function mark(box: HTMLElement, kind: keyof typeof CUE_TEXT): void {
  const over = box.scrollWidth > box.clientWidth + 1;
  box.toggleAttribute("data-overflow", over);
  if (!over) return;
  if (kind === "table" && !(box.nextElementSibling instanceof HTMLElement && box.nextElementSibling.classList.contains("scroll-cue"))) {
    const cue = document.createElement("p");
    cue.className = "scroll-cue";
    cue.dataset.scrollCue = "";
    cue.textContent = CUE_TEXT.table;
    box.after(cue);
  }
  if (kind === "figure" && !box.querySelector(":scope > .scroll-cue")) {
    const cue = document.createElement("p");
    cue.className = "scroll-cue";
    cue.dataset.scrollCue = "";
    cue.textContent = CUE_TEXT.figure;
    box.prepend(cue);
  }
}

export function markOverflow(root: ParentNode = document): void {
  for (const w of root.querySelectorAll<HTMLElement>(".table-wrap")) mark(w, "table");
  for (const f of root.querySelectorAll<HTMLElement>(".figs figure, figure[data-figure], .sheet-map-scroll")) mark(f, "figure");
}

let pending = 0;
const later = () => { cancelAnimationFrame(pending); pending = requestAnimationFrame(() => markOverflow()); };
addEventListener("resize", later);
addEventListener("load", later);
new ResizeObserver(later).observe(document.documentElement);
markOverflow();
