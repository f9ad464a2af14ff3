import { Component, createRef, type ReactNode } from 'react';
import type { AppStore } from '../state/store.js';
import type { Recovery } from './recoveryActions.js';

interface State {
  error: Error | null;
  busy: boolean;
  problems: string[];
}

/**
 * A render error shows a recovery screen. The project stays kept; if it is what makes the screen
 * fail, every reload would fail again, so the screen offers ways out that keep it as a kept copy:
 * download it, start without it, open a file or start a new project.
 */
export class ErrorBoundary extends Component<{ store: AppStore; recovery: Recovery; children: ReactNode }, State> {
  override state: State = { error: null, busy: false, problems: [] };
  private fileInput = createRef<HTMLInputElement>();

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  private run = async (job: () => Promise<void>, thenRetry: boolean) => {
    this.setState({ busy: true, problems: [] });
    try {
      await job();
      if (thenRetry) this.setState({ error: null, busy: false });
      else this.setState({ busy: false });
    } catch (e) {
      this.setState({ busy: false, problems: [describe(e)] });
    }
  };

  private open = (file: File | undefined) =>
    file &&
    void this.run(async () => {
      const problems = await this.props.recovery.open(file);
      if (problems) throw new Refused(file.name, problems);
    }, true);

  override render() {
    const { error, busy, problems } = this.state;
    if (!error) return this.props.children;
    const { recovery } = this.props;
    const name = this.props.store.getState().project.name;
    return (
      <div className="recovery" role="alert" data-testid="recovery">
        <h1>Mainbrace stopped drawing this screen</h1>
        <p>
          Your project “{name}” is safe: it is kept in this browser. If this screen comes back after every reload, the
          kept project is what stops it: download it (to send with a report), then start without it. Starting without
          it, opening a file or starting a new project each keep it in <em>Kept copies</em>.
        </p>
        <p className="muted">What went wrong: {describe(error)}</p>
        <div className="recovery-actions">
          <button disabled={busy} onClick={() => void this.run(recovery.downloadKept, false)}>
            Download the kept project
          </button>
          <button disabled={busy} onClick={() => void this.run(recovery.startWithout, false)}>
            Start without the kept project
          </button>
          <button disabled={busy} onClick={() => this.fileInput.current?.click()}>
            Open a project file…
          </button>
          <input
            ref={this.fileInput}
            type="file"
            accept=".json,application/json"
            hidden
            data-testid="recovery-open"
            onChange={(e) => {
              this.open(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
          <button disabled={busy} onClick={() => void this.run(recovery.startNew, true)}>
            New project
          </button>
          <button disabled={busy} onClick={() => this.setState({ error: null })}>
            Try again
          </button>
        </div>
        {problems.length > 0 && (
          <ul className="recovery-problems" data-testid="recovery-problems">
            {problems.map((p, i) => (
              <li key={i}>{p}</li>
            ))}
          </ul>
        )}
      </div>
    );
  }
}

class Refused extends Error {
  constructor(
    file: string,
    readonly lines: string[],
  ) {
    super(`${file} was not opened: ${lines.join('; ')}`);
  }
}

/** An error as one readable line: never blank. */
function describe(e: unknown): string {
  if (e instanceof Error) return e.message || e.name || 'no reason given';
  return String(e) || 'no reason given';
}
