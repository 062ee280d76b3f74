"use client";
/**
 * Exports the Aim board as a PNG: the B-plane SVG (serialized; its colours are literal values)
 * drawn on a canvas at 2× with a title and the readout lines beneath, then downloaded.
 */
export async function exportBoardPng(svg: SVGSVGElement, opts: { title: string; lines: string[]; background: string; text: string; fileName: string }): Promise<void> {
  const size = svg.viewBox.baseVal?.width || 560;
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  clone.setAttribute("width", String(size));
  clone.setAttribute("height", String(size));
  const xml = new XMLSerializer().serializeToString(clone);
  const url = URL.createObjectURL(new Blob([xml], { type: "image/svg+xml;charset=utf-8" }));
  try {
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error("the board could not be rendered as an image"));
      img.src = url;
    });
    const scale = 2;
    const width = Math.max(size, 760);
    const lineH = 18;
    const head = 40;
    const foot = 16 + lineH * opts.lines.length;
    const canvas = document.createElement("canvas");
    canvas.width = width * scale;
    canvas.height = (size + head + foot) * scale;
    const ctx = canvas.getContext("2d");
    if (!ctx) throw new Error("no 2D canvas");
    ctx.scale(scale, scale);
    ctx.fillStyle = opts.background;
    ctx.fillRect(0, 0, width, size + head + foot);
    ctx.fillStyle = opts.text;
    // Shrink the title until it fits the width.
    let px = 16;
    do {
      ctx.font = `600 ${px}px ui-sans-serif, system-ui, sans-serif`;
      px -= 1;
    } while (px > 9 && ctx.measureText(opts.title).width > width - 28);
    ctx.fillText(opts.title, 14, 26);
    ctx.drawImage(img, (width - size) / 2, head, size, size);
    ctx.font = "12px ui-monospace, monospace";
    opts.lines.forEach((l, i) => ctx.fillText(l, 14, head + size + 16 + i * lineH));
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
    if (!blob) throw new Error("PNG encoding failed");
    const a = document.createElement("a");
    a.href = URL.createObjectURL(blob);
    a.download = opts.fileName;
    document.body.appendChild(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(a.href), 5000);
  } finally {
    URL.revokeObjectURL(url);
  }
}
