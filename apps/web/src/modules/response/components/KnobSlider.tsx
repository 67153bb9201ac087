// One labelled tuning slider: its name, its value in words and units, and a Blueprint slider with an accessible name.
import { Slider } from '@blueprintjs/core';

type Props = {
  /** Accessible name and visible label, e.g. "Coupling of g(1,0)e". */
  label: string;
  value: number;
  min: number;
  max: number;
  stepSize: number;
  /** The value in words and units, e.g. "0.250 (25.0 % of the power crosses)". */
  valueText: string;
  onChange: (value: number) => void;
  testId?: string;
};

/** A slider whose every drag step is reported. */
export function KnobSlider({ label, value, min, max, stepSize, valueText, onChange, testId }: Props) {
  const shown = Math.min(max, Math.max(min, value));
  return (
    <div className="hx-tuning-knob" data-testid={testId}>
      <div className="hx-tuning-knob-head">
        <span>{label}</span>
        <span className="hx-tuning-knob-value">{valueText}</span>
      </div>
      <Slider min={min} max={max} stepSize={stepSize} value={shown} onChange={onChange} labelRenderer={false} handleHtmlProps={{ 'aria-label': label }} />
    </div>
  );
}
