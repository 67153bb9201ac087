// Every live gate of the draft in a sortable table with drive values; copy a selection or the whole table.
import { Button, HTMLSelect, Switch } from '@blueprintjs/core';
import { Cell, Column, ColumnHeaderCell, Table2 } from '@blueprintjs/table';
import type { ConfigurationFile, ShifterCalibrationBody } from '@hexloom/contracts';
import { useMemo, useState } from 'react';
import { GATE_TABLE_COLUMNS, gateTableTsv } from '../utils/gateTableColumns.js';
import { gateRows } from '../utils/gateRows.js';
import { sortGateRows, type GateSort } from '../utils/sortGateRows.js';

type Props = { content: ConfigurationFile; calibration?: readonly ShifterCalibrationBody[]; onSelectGate?: (gateId: string) => void };

/** Sorted by any column; "Only set gates" hides idle ones; the total heater power is summed under the table. */
export function GateTable({ content, calibration, onSelectGate }: Props) {
  const [sort, setSort] = useState<GateSort>({ key: 'gate', descending: false });
  const [onlySet, setOnlySet] = useState(true);
  const [copied, setCopied] = useState(false);
  const all = useMemo(() => gateRows(content, calibration), [content, calibration]);
  const rows = useMemo(() => sortGateRows(onlySet ? all.filter((r) => r.state !== 'idle') : all, sort), [all, onlySet, sort]);
  const totalPowerMw = all.reduce((s, r) => s + r.powerW, 0) * 1e3;
  const copy = async (): Promise<void> => {
    await navigator.clipboard.writeText(gateTableTsv(rows));
    setCopied(true);
  };
  return (
    <section className="hx-stack" data-testid="gate-table">
      <div className="hx-row">
        <label className="hx-inline-label">
          Sort by{' '}
          <HTMLSelect aria-label="Sort gates by" value={sort.key} onChange={(e) => setSort({ ...sort, key: e.currentTarget.value as GateSort['key'] })}>
            {GATE_TABLE_COLUMNS.map((c) => (
              <option key={c.key} value={c.key}>
                {c.name}
              </option>
            ))}
          </HTMLSelect>
        </label>
        <Button size="small" variant="minimal" icon={sort.descending ? 'sort-desc' : 'sort-asc'} aria-label={sort.descending ? 'Sort ascending' : 'Sort descending'} onClick={() => setSort({ ...sort, descending: !sort.descending })} />
        <Switch checked={onlySet} label="Only set gates" onChange={() => setOnlySet(!onlySet)} />
        <Button icon="clipboard" onClick={() => void copy()} text={copied ? 'Copied' : 'Copy table'} />
        <span className="hx-muted">
          {rows.length} gates · total heater power {totalPowerMw.toFixed(1)} mW{calibration?.length ? '' : ' (nominal shifters: no calibration uploaded)'}
        </span>
      </div>
      <div className="hx-gate-table">
        <Table2
          numRows={rows.length}
          enableRowHeader={false}
          cellRendererDependencies={[rows]}
          getCellClipboardData={(row, col) => GATE_TABLE_COLUMNS[col]!.text(rows[row]!)}
          onFocusedCell={(f) => rows[f.row] && onSelectGate?.(rows[f.row]!.gate)}
          enableFocusedCell
        >
          {GATE_TABLE_COLUMNS.map((c) => (
            <Column
              key={c.key}
              name={c.name}
              columnHeaderCellRenderer={() => <ColumnHeaderCell name={c.name} nameRenderer={(name) => <button type="button" className="hx-column-sort" onClick={() => setSort({ key: c.key, descending: sort.key === c.key ? !sort.descending : false })}>{name}{sort.key === c.key ? (sort.descending ? ' ▼' : ' ▲') : ''}</button>} />}
              cellRenderer={(i) => <Cell className={rows[i]?.overLimit && /drive|Power|Current/.test(c.name) ? 'hx-over-limit' : undefined}>{c.text(rows[i]!)}</Cell>}
            />
          ))}
        </Table2>
      </div>
    </section>
  );
}
