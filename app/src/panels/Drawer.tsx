import { useLayoutEffect, useRef } from 'react';
import { useActions, useApp } from '../state/StoreContext.js';
import type { DrawerTab } from '../state/store.js';
import { ScheduleTable } from './ScheduleTable.js';
import { lazyPart } from '../chrome/lazyPart.js';

// The tabs after the schedule load in chunks of their own (docs/performance.md: the first screen shows the schedule).
const loading = (what: string) => <p className="muted">Loading {what}…</p>;
const ProfilePanel = lazyPart(() => import('./ProfilePanel.js').then((m) => m.ProfilePanel), loading('the profile'));
const CasesPanel = lazyPart(() => import('./CasesPanel.js').then((m) => m.CasesPanel), loading('the pressure cases'));
const SoilsPanel = lazyPart(() => import('./SoilsPanel.js').then((m) => m.SoilsPanel), loading('the soils'));
const UnderlayPanel = lazyPart(
  () => import('./UnderlayPanel.js').then((m) => m.UnderlayPanel),
  loading('the site plan'),
);
const SheetPanel = lazyPart(() => import('./SheetPanel.js').then((m) => m.SheetPanel), loading('the sheet'));

const TABS: { tab: DrawerTab; label: string }[] = [
  { tab: 'schedule', label: 'Schedule' },
  { tab: 'profile', label: 'Profile' },
  { tab: 'cases', label: 'Pressure cases' },
  { tab: 'soils', label: 'Soils & design' },
  { tab: 'underlay', label: 'Site plan' },
  { tab: 'sheet', label: 'Sheet & quantities' },
];

/** The route-wide views under the plan; it can be raised to fill the window for the schedule. */
export function Drawer() {
  const drawer = useApp((s) => s.drawer);
  const actions = useActions();
  const heights = ['closed', 'low', 'high', 'full'] as const;
  const i = heights.indexOf(drawer.height);
  // Each tab keeps its own scroll position: the schedule stays where it was after a look at the cases.
  const body = useRef<HTMLDivElement>(null);
  const scrolls = useRef(new Map<DrawerTab, number>());
  // Not on mount, where the body is at the top already: setting scrollTop forces a layout in the first draw.
  const mounted = useRef(false);
  useLayoutEffect(() => {
    const el = body.current;
    if (el && mounted.current) el.scrollTop = scrolls.current.get(drawer.tab) ?? 0;
    mounted.current = true;
  }, [drawer.tab, drawer.height]);
  return (
    <section className={`drawer drawer-${drawer.height}`} aria-label="Route views">
      <div className="drawer-tabs" role="tablist">
        {TABS.map((t) => (
          <button
            key={t.tab}
            role="tab"
            id={`tab-${t.tab}`}
            aria-selected={drawer.tab === t.tab && drawer.height !== 'closed'}
            aria-controls="drawer-body"
            className={drawer.tab === t.tab && drawer.height !== 'closed' ? 'on' : ''}
            onClick={() => actions.setDrawer(t.tab)}
            data-testid={`tab-${t.tab}`}
          >
            {t.label}
          </button>
        ))}
        <span className="spacer" />
        <button
          title="Lower the drawer"
          aria-label="Lower the drawer"
          disabled={i === 0}
          onClick={() => actions.setDrawerHeight(heights[Math.max(0, i - 1)]!)}
        >
          ▾
        </button>
        <button
          title="Raise the drawer"
          aria-label="Raise the drawer"
          disabled={i === heights.length - 1}
          onClick={() => actions.setDrawerHeight(heights[Math.min(heights.length - 1, i + 1)]!)}
          data-testid="drawer-raise"
        >
          ▴
        </button>
      </div>
      {drawer.height !== 'closed' && (
        <div
          className="drawer-body"
          id="drawer-body"
          role="tabpanel"
          aria-labelledby={`tab-${drawer.tab}`}
          ref={body}
          onScroll={(e) => scrolls.current.set(drawer.tab, e.currentTarget.scrollTop)}
          data-testid="drawer-body"
        >
          {drawer.tab === 'schedule' && <ScheduleTable />}
          {drawer.tab === 'profile' && <ProfilePanel />}
          {drawer.tab === 'cases' && <CasesPanel />}
          {drawer.tab === 'soils' && <SoilsPanel />}
          {drawer.tab === 'underlay' && <UnderlayPanel />}
          {drawer.tab === 'sheet' && <SheetPanel />}
        </div>
      )}
    </section>
  );
}
