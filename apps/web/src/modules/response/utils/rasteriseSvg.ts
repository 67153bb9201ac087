// PNG of an SVG document: drawn on a canvas at a chosen scale, then encoded by the browser.

/** A PNG blob of `markup` (an SVG document of `width` x `height` user units) at `scale` pixels per unit. */
export function rasteriseSvg(markup: string, width: number, height: number, scale = 2): Promise<Blob> {
  return new Promise((resolve, reject) => {
    const url = URL.createObjectURL(new Blob([markup], { type: 'image/svg+xml' }));
    const image = new Image();
    image.onload = () => {
      const canvas = document.createElement('canvas');
      canvas.width = Math.round(width * scale);
      canvas.height = Math.round(height * scale);
      const context = canvas.getContext('2d');
      if (!context) {
        URL.revokeObjectURL(url);
        reject(new Error('This browser cannot draw on a canvas, so the plot cannot be saved as PNG; save it as SVG instead.'));
        return;
      }
      context.drawImage(image, 0, 0, canvas.width, canvas.height);
      URL.revokeObjectURL(url);
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The browser could not encode the PNG; save the plot as SVG instead.'))), 'image/png');
    };
    image.onerror = () => {
      URL.revokeObjectURL(url);
      reject(new Error('The browser could not read the plot as an image; save it as SVG instead.'));
    };
    image.src = url;
  });
}
