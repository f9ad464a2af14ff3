import { describe, expect, it, afterEach } from 'vitest';
import { Component, type ReactNode } from 'react';
import { cleanup, render, screen } from '@testing-library/react';
import { lazyPart } from './lazyPart.js';

afterEach(cleanup);

/** Stands for the app's error screen: shows what reached it. */
class Outer extends Component<{ children: ReactNode }, { error: Error | null }> {
  override state: { error: Error | null } = { error: null };
  static getDerivedStateFromError(error: Error) {
    return { error };
  }
  override render() {
    return this.state.error ? <p data-testid="outer">{this.state.error.message}</p> : this.props.children;
  }
}

describe('a part off the first screen', () => {
  it('whose code cannot be loaded says so in its place, and the rest of the screen stays', async () => {
    const Part = lazyPart<object>(() => Promise.reject(new Error('chunk gone')));
    render(
      <Outer>
        <p>the plan</p>
        <Part />
      </Outer>,
    );
    expect((await screen.findByRole('alert')).textContent).toMatch(/could not be loaded: reload the page/);
    expect(screen.getByText('the plan')).toBeTruthy();
    expect(screen.queryByTestId('outer')).toBeNull();
  });

  it('that loads and then fails to draw goes to the app’s error screen, as if it had been there all along', async () => {
    function Broken(): ReactNode {
      throw new Error('bad data in the part');
    }
    const Part = lazyPart<object>(() => Promise.resolve(Broken));
    render(
      <Outer>
        <Part />
      </Outer>,
    );
    expect((await screen.findByTestId('outer')).textContent).toBe('bad data in the part');
  });
});
