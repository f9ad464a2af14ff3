import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { resultsOf } from '../state/results.js';
import { NodeDetails } from './NodeDetails.js';
import { PipeDetails } from './PipeDetails.js';
import { chain, demoProject, DN300 } from '../testFixtures.js';

afterEach(cleanup);

describe('the details panel names nodes as the plan and the schedule do', () => {
  const project = demoProject();
  const store = createAppStore(project, DN300);
  const actions = createActions(store);
  const doc = store.getState().project;
  const marks = resultsOf(doc).marks;
  const view = (ui: React.ReactNode) =>
    render(
      <StoreProvider store={store} actions={actions}>
        {ui}
      </StoreProvider>,
    ).container;

  it('a fitting by its mark, with the file id only as a muted aside', () => {
    const [id, mark] = [...marks].find(([, m]) => m === 'A4')!;
    const node = doc.nodes.find((n) => n.id === id)!;
    const h = view(<NodeDetails node={node} project={doc} pipeCount={2} />).querySelector('h3')!;
    expect(h.textContent).toBe(`Node ${mark} id ${id}`);
  });

  it('a pipe by the marks (or places) of its ends, never by ids alone', () => {
    const pipe = doc.pipes.find((p) => marks.has(p.from) && marks.has(p.to))!;
    const h = view(<PipeDetails pipe={pipe} project={doc} />).querySelector('h3')!;
    expect(h.textContent).toContain(`Pipe from ${marks.get(pipe.from)} to ${marks.get(pipe.to)}`);
  });

  it('an unmarked, unlabelled joint by where it lies', () => {
    // A straight joint at (50, 0) between the dead end at (0, 0) and a bend at (100, 0).
    const line = createAppStore(chain([0, 0], [50, 0], [100, 0], [100, 60]), DN300);
    const doc = line.getState().project;
    const t = render(
      <StoreProvider store={line} actions={createActions(line)}>
        <PipeDetails pipe={doc.pipes[1]!} project={doc} />
      </StoreProvider>,
    ).container.querySelector('h3')!.textContent!;
    expect(t).toMatch(/^Pipe from the point at 50.00 m E, 0 m N to A\d/);
  });
});
