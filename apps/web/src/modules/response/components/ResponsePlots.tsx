// Response plots of one or more port pairs: transmission, phase, group delay, dispersion and the RF view, with the mask.
import { Button, ButtonGroup, Callout, HTMLSelect, Switch, Tab, Tabs } from '@blueprintjs/core';
import type { Mask, SpectrumFile } from '@hexloom/contracts';
import { SPEED_OF_LIGHT_M_PER_S, type RfScheme } from '@hexloom/solver';
import { useMemo, useRef, useState } from 'react';
import { maskShapes } from '../utils/maskShapes.js';
import { pairLabel } from '../utils/pairLabel.js';
import { PLOT_VIEWS, type PlotView, RF_SCHEMES, viewAxis } from '../utils/plotViews.js';
import { traceSeries } from '../utils/traceSeries.js';
import { wavelengthNm } from '../utils/wavelengthNm.js';
import '../responsePlots.css';
import { CursorReadout } from './CursorReadout.js';
import { PlotDownloads } from './PlotDownloads.js';
import { PlotLegend } from './PlotLegend.js';
import { ResponseChart } from './ResponseChart.js';
import type { CommentBand } from './CommentBands.js';

/** Spectra to overlay (one per port pair), the mask to check them against, and the carrier the offsets count from. */
export type ResponsePlotsProps = { spectra: SpectrumFile[]; mask?: Mask; referenceFrequencyHz: number; title?: string; /** Bands review comments point at, shaded on every view. */ bands?: readonly CommentBand[] };

const DECIMALS: Record<PlotView, number> = { transmission: 2, phase: 3, delay: 1, dispersion: 2, rf: 2 };

/** Tabs of views over one chart with a legend, a cursor read-out, drag-to-zoom and downloads. */
export function ResponsePlots({ spectra, mask, referenceFrequencyHz, title, bands }: ResponsePlotsProps) {
  const [view, setView] = useState<PlotView>('transmission');
  const [linear, setLinear] = useState(false);
  const [rfScheme, setRfScheme] = useState<RfScheme>('imdd');
  const [showWavelength, setShowWavelength] = useState(false);
  const [zoom, setZoom] = useState<[number, number] | null>(null);
  const [cursorGhz, setCursorGhz] = useState<number | null>(null);
  const [downloadError, setDownloadError] = useState<string | undefined>(undefined);
  const svgRef = useRef<SVGSVGElement | null>(null);

  const options = useMemo(() => ({ referenceFrequencyHz, linear, rfScheme }), [referenceFrequencyHz, linear, rfScheme]);
  const series = useMemo(() => spectra.map((s) => traceSeries(s, view, options)), [spectra, view, options]);
  const shapes = useMemo(
    () => (mask ? maskShapes(mask, spectra, (i) => traceSeries(spectra[i] as SpectrumFile, view, { ...options, linear: false }), view, linear) : []),
    [mask, spectra, view, options, linear],
  );
  const labels = spectra.map(pairLabel);
  const axis = viewAxis(view, linear);
  const rf = view === 'rf';
  const wavelength = showWavelength && !rf ? { toNm: (g: number) => wavelengthNm(referenceFrequencyHz + g * 1e9), fromNm: (nm: number) => (SPEED_OF_LIGHT_M_PER_S / (nm * 1e-9) - referenceFrequencyHz) / 1e9 } : undefined;
  const xLabel = rf ? 'RF tone frequency (GHz)' : 'Offset from the carrier (GHz)';
  const heading = title ?? 'Response';
  const chooseView = (next: PlotView) => {
    setView(next);
    setZoom(null);
    setCursorGhz(null);
  };

  const body = (
    <>
      <div className="hx-rp-toolbar">
        {view === 'transmission' && (
          <ButtonGroup role="group" aria-label="Power scale">
            <Button text="dB" aria-label="Power in dB" aria-pressed={!linear} active={!linear} onClick={() => setLinear(false)} />
            <Button text="Linear" aria-label="Power as a linear ratio" aria-pressed={linear} active={linear} onClick={() => setLinear(true)} />
          </ButtonGroup>
        )}
        {rf && (
          <HTMLSelect aria-label="RF modulation and detection" value={rfScheme} onChange={(e) => setRfScheme(e.currentTarget.value as RfScheme)} options={RF_SCHEMES.map((s) => ({ value: s.id, label: s.label }))} />
        )}
        {!rf && <Switch className="hx-rp-switch" label="Wavelength axis" checked={showWavelength} onChange={(e) => setShowWavelength(e.currentTarget.checked)} />}
        <Button icon="zoom-to-fit" text="Whole span" aria-label="Show the whole span" disabled={zoom === null} onClick={() => setZoom(null)} variant="minimal" />
        <PlotDownloads spectra={spectra} svgRef={svgRef} fileBase={`${heading}-${view}`} onError={setDownloadError} />
      </div>
      {rf && (
        <p className="hx-rp-note" data-testid="rf-note">
          RF gain an RF tone sees after the chip and a photodetector, the optical carrier at the reference frequency ({(referenceFrequencyHz / 1e12).toFixed(3)} THz); worked out from the
          sampled optical response, so tones reach only as far as the plotted span on both sides of the carrier.
        </p>
      )}
      {downloadError && (
        <Callout intent="warning" title="The download did not work">
          {downloadError}
        </Callout>
      )}
      <ResponseChart
        series={series}
        shapes={shapes}
        xLabel={xLabel}
        yLabel={`${axis.quantity} (${axis.unit})`}
        ariaLabel={`${axis.quantity} of ${labels.join(', ')}`}
        zoom={zoom}
        onZoom={setZoom}
        cursorGhz={cursorGhz}
        onCursor={setCursorGhz}
        svgRef={svgRef}
        bands={bands}
        {...(wavelength ? { wavelength } : {})}
      />
      <div className="hx-rp-foot">
        <PlotLegend labels={labels} />
        {shapes.length > 0 && (
          <p className="hx-rp-mask-verdict" data-testid="mask-verdict">
            {shapes.some((s) => s.fails.length > 0) ? `The curve breaks the mask in ${shapes.filter((s) => s.fails.length > 0).length} of ${shapes.length} regions (shaded in the fail colour).` : `The curve meets all ${shapes.length} mask regions shown.`}
          </p>
        )}
      </div>
      <CursorReadout series={series} labels={labels} unit={axis.unit} cursorGhz={cursorGhz} rfAxis={rf} decimals={linear && view === 'transmission' ? 4 : DECIMALS[view]} />
    </>
  );

  if (spectra.length === 0) return <Callout intent="primary">There is no connection to plot yet.</Callout>;
  return (
    <section className="hx-rp" aria-label={`${heading}: response plots`} data-testid="response-plots">
      <div className="hx-rp-head">
        {title && <h3 className="hx-rp-title">{title}</h3>}
        <Tabs id="hx-response-views" selectedTabId={view} onChange={(id) => chooseView(id as PlotView)} className="hx-rp-tabs" renderActiveTabPanelOnly>
          {PLOT_VIEWS.map((v) => (
            <Tab key={v.id} id={v.id} title={v.title} panel={body} panelClassName="hx-rp-panel" />
          ))}
        </Tabs>
      </div>
    </section>
  );
}
