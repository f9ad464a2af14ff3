/** The plan's mark for the first time the route is on screen (plan/PlanView.tsx). */
const DRAWN = 'mainbrace-plan-drawn';
/** A start with nothing to draw (a blank project) never sets the mark: warm up after this long, ms. */
const AT_THE_LATEST_MS = 1500;

/**
 * Runs `load` once the first screen is drawn, so that what it fetches and compiles (the schema checks,
 * the panels off the first screen) does not hold up the first draw but is here before it is needed.
 */
export function afterFirstDraw(load: () => void): void {
  let done = false;
  const run = () => {
    if (done) return;
    done = true;
    observer?.disconnect();
    clearTimeout(timer);
    setTimeout(load, 0); // after the frame that drew the plan
  };
  const timer = setTimeout(run, AT_THE_LATEST_MS);
  let observer: PerformanceObserver | null = null;
  if (performance.getEntriesByName(DRAWN).length > 0) return run();
  try {
    observer = new PerformanceObserver((list) => {
      if (list.getEntriesByName(DRAWN).length > 0) run();
    });
    observer.observe({ type: 'mark' });
  } catch {
    // no observer of marks: the timer alone
  }
}
