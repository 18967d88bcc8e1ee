/** Saving charts and data as files, in the browser. */

/** Offers `blob` as a download named `filename`. */
export function download(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL goes away.
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/**
 * The chart drawn inside `container` as a standalone SVG document: the chart's own <svg> with a
 * white background and the page's font written in, so it looks the same outside the app.
 */
export function chartSvg(container: HTMLElement): { text: string; width: number; height: number } | null {
  const svg = container.querySelector('svg.recharts-surface');
  if (!(svg instanceof SVGSVGElement)) return null;
  const { width, height } = svg.getBoundingClientRect();
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  copy.setAttribute('width', String(Math.round(width)));
  copy.setAttribute('height', String(Math.round(height)));
  copy.setAttribute('font-family', getComputedStyle(container).fontFamily);
  copy.setAttribute('font-size', getComputedStyle(container).fontSize);
  const background = document.createElementNS('http://www.w3.org/2000/svg', 'rect');
  background.setAttribute('width', '100%');
  background.setAttribute('height', '100%');
  background.setAttribute('fill', '#FFFFFF');
  copy.insertBefore(background, copy.firstChild);
  return { text: new XMLSerializer().serializeToString(copy), width, height };
}

export function saveSvg(container: HTMLElement, name: string): void {
  const svg = chartSvg(container);
  if (svg) download(new Blob([svg.text], { type: 'image/svg+xml' }), `${name}.svg`);
}

/** Draws the chart's SVG on a canvas at twice its size and saves it as PNG. */
export async function savePng(container: HTMLElement, name: string): Promise<void> {
  const svg = chartSvg(container);
  if (!svg) return;
  const url = URL.createObjectURL(new Blob([svg.text], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const scale = 2;
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(svg.width * scale);
    canvas.height = Math.round(svg.height * scale);
    const context = canvas.getContext('2d');
    if (!context) return;
    context.scale(scale, scale);
    context.drawImage(image, 0, 0, svg.width, svg.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (blob) download(blob, `${name}.png`);
  } finally {
    URL.revokeObjectURL(url);
  }
}
