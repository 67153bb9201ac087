// The download menu of a response plot: the plot as SVG or PNG, each connection's data as CSV or Touchstone.
import { Button, Menu, MenuDivider, MenuItem, Popover } from '@blueprintjs/core';
import type { SpectrumFile } from '@hexloom/contracts';
import type { RefObject } from 'react';
import { downloadBlob } from '../utils/downloadBlob.js';
import { pairLabel } from '../utils/pairLabel.js';
import { rasteriseSvg } from '../utils/rasteriseSvg.js';
import { spectrumCsv } from '../utils/spectrumCsv.js';
import { spectrumTouchstone } from '../utils/spectrumTouchstone.js';
import { svgMarkup } from '../utils/svgMarkup.js';
import { PLOT_HEIGHT, PLOT_WIDTH } from './plotLayout.js';

type Props = {
  spectra: readonly SpectrumFile[];
  svgRef: RefObject<SVGSVGElement | null>;
  /** Base of the file names, e.g. "circuit-bandpass-transmission". */
  fileBase: string;
  onError: (message: string | undefined) => void;
};

/** A file-name-safe form of a text ("W11 → E14" becomes "W11-E14"). */
export const fileSafe = (text: string): string => text.replace(/→/g, '-').replace(/[^A-Za-z0-9._-]+/g, '-').replace(/-+/g, '-').replace(/^-|-$/g, '') || 'response';

/** The background of the exported plot: the page surface of the current theme. */
const surface = (svg: SVGSVGElement): string => window.getComputedStyle(svg).getPropertyValue('--hx-surface').trim() || '#ffffff';

/** One button opening the menu of downloads. */
export function PlotDownloads({ spectra, svgRef, fileBase, onError }: Props) {
  const markup = (): string | undefined => {
    const svg = svgRef.current;
    return svg ? svgMarkup(svg, surface(svg)) : undefined;
  };
  const saveSvg = () => {
    const text = markup();
    if (text) downloadBlob(new Blob([text], { type: 'image/svg+xml' }), `${fileSafe(fileBase)}.svg`);
  };
  const savePng = () => {
    const text = markup();
    if (!text) return;
    onError(undefined);
    rasteriseSvg(text, PLOT_WIDTH, PLOT_HEIGHT)
      .then((blob) => downloadBlob(blob, `${fileSafe(fileBase)}.png`))
      .catch((error: unknown) => onError(error instanceof Error ? error.message : String(error)));
  };
  const menu = (
    <Menu aria-label="Downloads">
      <MenuItem icon="media" text="Plot as SVG" onClick={saveSvg} />
      <MenuItem icon="media" text="Plot as PNG" onClick={savePng} />
      <MenuDivider title="Data" />
      {spectra.map((s, i) => (
        <MenuItem key={`csv${i}`} icon="th" text={`${pairLabel(s)} as CSV`} onClick={() => downloadBlob(new Blob([spectrumCsv(s)], { type: 'text/csv' }), `${fileSafe(pairLabel(s))}.csv`)} />
      ))}
      {spectra.map((s, i) => (
        <MenuItem key={`s2p${i}`} icon="export" text={`${pairLabel(s)} as Touchstone (.s2p)`} onClick={() => downloadBlob(new Blob([spectrumTouchstone(s)], { type: 'text/plain' }), `${fileSafe(pairLabel(s))}.s2p`)} />
      ))}
    </Menu>
  );
  return (
    <Popover content={menu} placement="bottom-end">
      <Button icon="download" text="Download" aria-label="Download the plot or its data" variant="outlined" />
    </Popover>
  );
}
