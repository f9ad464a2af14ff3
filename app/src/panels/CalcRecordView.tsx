import { calculationRecord, type FittingAnalysis, type Project } from '@mainbrace/solver';
import { show } from '../format/quantity.js';
import { useApp } from '../state/StoreContext.js';

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
                  <td className="num">{show(v.value, v.dimension, units, 4)}</td>
                  <td>
                    {v.label}
                    {v.source && <span className="src"> — {v.source}</span>}
                  </td>
                </tr>
              ))}
              <tr className="record-result">
                <td className="sym">{step.result.symbol}</td>
                <td className="num">{show(step.result.value, step.result.dimension, units, 4)}</td>
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
