import { Component, type ReactNode } from 'react';
import type { AppStore } from '../state/store.js';
import { download, fileStem, projectText } from '../files/projectFile.js';

/** A render error shows a recovery screen that keeps the project and offers to save it. */
export class ErrorBoundary extends Component<{ store: AppStore; children: ReactNode }, { error: Error | null }> {
  override state = { error: null as Error | null };

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  override render() {
    if (!this.state.error) return this.props.children;
    const project = this.props.store.getState().project;
    return (
      <div className="recovery" role="alert" data-testid="recovery">
        <h1>Mainbrace stopped drawing this screen</h1>
        <p>Your project is safe: it is still in this tab and in the browser’s storage. Save a copy, then reload.</p>
        <p className="muted">What went wrong: {this.state.error.message}</p>
        <button onClick={() => download(`${fileStem(project)}.json`, projectText(project), 'application/json')}>
          Save the project
        </button>{' '}
        <button onClick={() => window.location.reload()}>Reload</button>{' '}
        <button onClick={() => this.setState({ error: null })}>Try again</button>
      </div>
    );
  }
}
