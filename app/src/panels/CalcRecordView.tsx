import {
  calculationRecord,
  formatSi,
  type Dimension,
  type FittingAnalysis,
  type Project,
  type UnitSystem,
} from '@mainbrace/solver';
import { useApp } from '../state/StoreContext.js';

/**
 * A working figure of the record, to four significant figures as `mainbrace explain` writes it: a checker
 * follows each step with the figures it used, so a record's figures differ from the schedule's on
 * purpose; the results a crew builds to are the schedule's.
 */
const working = (si: number, dim: Dimension, units: UnitSystem) => formatSi(si, dim, units, 4);

/** A fitting's calculation record: each step's formula, its inputs with their sources, and the result. */
export function CalcRecordView({ fitting, project }: { fitting: FittingAnalysis; project: Project }) {
  const units = useApp((s) => s.units);
  return (
    <ol className="record">
      {calculationRecord(project, fitting).map((step, i) => (
        <li key={i}>
          <div className="record-title">{step.title}</div>
          <code className="record-formula">{step.formula}</code>
          <table>
            <tbody>
              {step.inputs.map((v, k) => (
                <tr key={k}>
                  <td className="sym">{v.symbol}</td>
                  <td className="num">{working(v.value, v.dimension, units)}</td>
                  <td>
                    {v.label}
                    {v.source && <span className="src"> — {v.source}</span>}
                  </td>
                </tr>
              ))}
              <tr className="record-result">
                <td className="sym">{step.result.symbol}</td>
                <td className="num">{working(step.result.value, step.result.dimension, units)}</td>
                <td>
                  {step.result.label}
                  {step.result.source && step.result.source !== 'computed' && (
                    <span className="src"> — {step.result.source}</span>
                  )}
                </td>
              </tr>
            </tbody>
          </table>
          <div className="record-ref">{step.reference}</div>
        </li>
      ))}
    </ol>
  );
}
