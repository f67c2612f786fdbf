/**
 * The diagram as a PNG, drawn in the page: the standalone SVG is decoded as
 * an image and painted on a canvas at twice its size, on white, so the
 * picture is sharp in slides and documents. No shell help is needed.
 */
// @ts-nocheck


/** The root element's width and height in pixels (from width/height, else the viewBox). */
export function svgPixelSize(svg: string): { width: number; height: number } {
  const root = /<svg\b[^>]*>/i.exec(svg)?.[0];
  if (!root) throw new Error('the diagram is not an SVG document');
  const attribute = (name: string) => new RegExp(`\\s${name}\\s*=\\s*["']([^"']*)["']`, 'i').exec(root)?.[1];
  // Pixels only: a percentage or another unit says nothing about the drawing's own size.
  const pixels = (value: string | undefined) => (value !== undefined && /^\s*\d+(?:\.\d+)?\s*(?:px)?\s*$/.test(value) ? Number.parseFloat(value) : NaN);
  let width = pixels(attribute('width'));
  let height = pixels(attribute('height'));
  if (!(width > 0 && height > 0)) {
    const box = (attribute('viewBox') ?? '').trim().split(/[\s,]+/).map(Number);
    [width, height] = [box[2], box[3]];
  }
  if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height))) throw new Error('the diagram has no size to draw it at');
  return { width, height };
}

export async function svgToPngBytes(svg: string, scale = 2): Promise<Uint8Array> {
  const { width, height } = svgPixelSize(svg);
  const image = new Image();
  // A data: address: the page's content policy allows data: images, and a data: image never taints the canvas.
  image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
  try {
    await image.decode();
  } catch {
    throw new Error('the diagram could not be drawn as an image');
  }
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const context = canvas.getContext('2d');
  if (!context) throw new Error('this window cannot draw on a canvas');
  context.fillStyle = '#ffffff';
  context.fillRect(0, 0, canvas.width, canvas.height);
  context.drawImage(image, 0, 0, canvas.width, canvas.height);
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
  if (!blob) throw new Error('the diagram could not be encoded as PNG');
  return new Uint8Array(await blob.arrayBuffer());
}
