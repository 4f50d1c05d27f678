import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '../../test/render';
import { lazyPage } from '../lazy-page';
import { RouteBoundary } from './route-boundary';
import { browserPage, isStaleChunkError, RELOAD_GUARD_MS, reloadOnceForNewVersion } from './stale-chunk';

/** What Chromium says when a chunk named in the old index.html is gone from the server. */
const staleChunk = () => new TypeError('Failed to fetch dynamically imported module: http://127.0.0.1/assets/findings-page-0ld.js');

let reload: ReturnType<typeof vi.spyOn>;
beforeEach(() => {
  sessionStorage.clear();
  browserPage.reloading = false;
  reload = vi.spyOn(browserPage, 'reload').mockImplementation(() => undefined);
  // React reports every error a boundary catches on the console; these tests cause them on purpose.
  vi.spyOn(console, 'error').mockImplementation(() => undefined);
});
afterEach(() => vi.restoreAllMocks());

describe('a page that fails while it draws', () => {
  it('shows a friendly message in place of the page, and Try again draws it anew', async () => {
    let broken = true;
    function Flaky() {
      if (broken) throw new Error('Cannot read properties of undefined (reading "means")');
      return <p>Means by treatment</p>;
    }
    renderWithApp(
      <>
        <nav>Trial sections</nav>
        <RouteBoundary>
          <Flaky />
        </RouteBoundary>
      </>,
    );
    expect(await screen.findByRole('heading', { name: 'This page ran into a problem' })).toBeInTheDocument();
    expect(screen.getByText(/Try again; if it keeps happening, reload the page/)).toBeInTheDocument();
    expect(screen.queryByText(/reading "means"/)).not.toBeInTheDocument();
    // Around the failed page, the rest of the app still stands.
    expect(screen.getByText('Trial sections')).toBeInTheDocument();
    broken = false; // the passing problem is gone (the data came back, say)
    await userEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Means by treatment')).toBeInTheDocument();
    expect(reload).not.toHaveBeenCalled();
  });

  it('leaving for another address clears the failure', async () => {
    function Broken(): never {
      throw new Error('broken page');
    }
    function Pages() {
      const [page, setPage] = useState<'broken' | 'fine'>('broken');
      return (
        <>
          <Link to="/trials" onClick={() => setPage('fine')}>
            Trials
          </Link>
          <RouteBoundary>{page === 'broken' ? <Broken /> : <p>Your trials</p>}</RouteBoundary>
        </>
      );
    }
    renderWithApp(<Pages />, { route: '/trials/3/findings' });
    expect(await screen.findByRole('heading', { name: 'This page ran into a problem' })).toBeInTheDocument();
    await userEvent.click(screen.getByRole('link', { name: 'Trials' }));
    expect(await screen.findByText('Your trials')).toBeInTheDocument();
  });
});

describe('a page whose code is gone after a redeploy', () => {
  it('reloads the page once, saying it is loading the new version', async () => {
    const Page = lazyPage(() => Promise.reject(staleChunk()), 'FindingsPage' as never);
    renderWithApp(
      <RouteBoundary>
        <Page />
      </RouteBoundary>,
    );
    expect(await screen.findByText('Loading the new version of Friable…')).toBeInTheDocument();
    expect(reload).toHaveBeenCalledTimes(1);
  });

  it('does not reload again when the reload did not help: it says so, with a button to reload by hand', async () => {
    reloadOnceForNewVersion(Date.now() - 5_000); // the reload a moment ago…
    expect(reload).toHaveBeenCalledTimes(1);
    browserPage.reloading = false; // …after which this is the new page
    const Page = lazyPage(() => Promise.reject(staleChunk()), 'FindingsPage' as never);
    renderWithApp(
      <RouteBoundary>
        <Page />
      </RouteBoundary>,
    );
    expect(await screen.findByRole('heading', { name: 'Friable was updated' })).toBeInTheDocument();
    expect(reload).toHaveBeenCalledTimes(1);
    await userEvent.click(screen.getByRole('button', { name: 'Reload the page' }));
    expect(reload).toHaveBeenCalledTimes(2);
  });

  it('shows the page once its code loads', async () => {
    const Page = lazyPage(() => Promise.resolve({ TrialsPage: () => <p>Your trials</p> }), 'TrialsPage');
    renderWithApp(
      <RouteBoundary what="your trials">
        <Page />
      </RouteBoundary>,
    );
    expect(await screen.findByText('Your trials')).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByText('Loading your trials…')).not.toBeInTheDocument());
  });
});

describe('the reload guard', () => {
  it('reloads at most once a minute in a tab', () => {
    const start = 1_800_000_000_000;
    expect(reloadOnceForNewVersion(start)).toBe(true);
    expect(reloadOnceForNewVersion(start + 10)).toBe(true); // the same page, still going away: not a second reload
    expect(reload).toHaveBeenCalledTimes(1);
    browserPage.reloading = false; // the reloaded page
    expect(reloadOnceForNewVersion(start + 1_000)).toBe(false);
    expect(reloadOnceForNewVersion(start + RELOAD_GUARD_MS - 1)).toBe(false);
    browserPage.reloading = false;
    expect(reloadOnceForNewVersion(start + RELOAD_GUARD_MS + 1)).toBe(true);
    expect(reload).toHaveBeenCalledTimes(2);
  });

  it('knows a failed chunk in the words of Chromium, Firefox and Safari, and nothing else', () => {
    expect(isStaleChunkError(staleChunk())).toBe(true);
    expect(isStaleChunkError(new TypeError('error loading dynamically imported module: https://x/assets/a.js'))).toBe(true);
    expect(isStaleChunkError(new TypeError('Importing a module script failed.'))).toBe(true);
    expect(isStaleChunkError(new Error('Unable to preload CSS for /assets/ledger-page-1a2b.css'))).toBe(true);
    expect(isStaleChunkError(new Error('The trial could not be found'))).toBe(false);
    expect(isStaleChunkError('Failed to fetch dynamically imported module')).toBe(false);
  });
});
