import { act, render, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ChartSlot, useChartDrawn } from './chart-slot';

/** A stand-in IntersectionObserver whose targets come into view when the test says so. */
class FakeObserver {
  static all: FakeObserver[] = [];
  targets: Element[] = [];
  constructor(private readonly callback: IntersectionObserverCallback) {
    FakeObserver.all.push(this);
  }
  observe(target: Element) {
    this.targets.push(target);
  }
  disconnect() {
    this.targets = [];
  }
  unobserve() {}
  takeRecords() {
    return [];
  }
  static show(label: string) {
    for (const observer of FakeObserver.all) {
      const target = observer.targets.find((t) => t.getAttribute('data-chart') === label);
      if (target) observer.callback([{ isIntersecting: true, target } as IntersectionObserverEntry], observer as unknown as IntersectionObserver);
    }
  }
}

/** A chart that says when it has drawn only when the test presses its button. */
function Chart({ name }: { name: string }) {
  const drawn = useChartDrawn();
  return (
    <button type="button" onClick={drawn}>
      {name} drawn
    </button>
  );
}

describe('ChartSlot', () => {
  beforeEach(() => {
    FakeObserver.all = [];
    vi.stubGlobal('IntersectionObserver', FakeObserver);
  });
  afterEach(() => vi.unstubAllGlobals());

  it('draws a chart only when it comes into view, and the next in view only once the one before has drawn', async () => {
    render(
      <>
        <ChartSlot height={300} label="first">
          <Chart name="first" />
        </ChartSlot>
        <ChartSlot height={300} label="second">
          <Chart name="second" />
        </ChartSlot>
        <ChartSlot height={300} label="third">
          <Chart name="third" />
        </ChartSlot>
      </>,
    );
    expect(screen.queryByRole('button')).toBeNull();

    await act(async () => FakeObserver.show('first'));
    expect(await screen.findByRole('button', { name: 'first drawn' })).toBeInTheDocument();

    await act(async () => FakeObserver.show('second'));
    // The second is in view but waits for the first to draw.
    expect(screen.queryByRole('button', { name: 'second drawn' })).toBeNull();
    await act(async () => screen.getByRole('button', { name: 'first drawn' }).click());
    expect(await screen.findByRole('button', { name: 'second drawn' })).toBeInTheDocument();
    // The third never came into view.
    expect(screen.queryByRole('button', { name: 'third drawn' })).toBeNull();
  });

  it('keeps the chart’s place at its height before it draws', () => {
    const { container } = render(
      <ChartSlot height={352} label="kept">
        <Chart name="kept" />
      </ChartSlot>,
    );
    expect(container.querySelector('[data-chart="kept"]')).toHaveStyle({ minHeight: '352px' });
  });
});
