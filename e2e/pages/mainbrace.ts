import { expect, type Page } from '@playwright/test';

/** What the read-only test hook of a test build shows: the document and its results (SI). */
export interface HookProject {
  name: string;
  units: 'si' | 'us';
  loadCases: { id: string; pressure: number; datumElevation?: number; flowFactor: number; kind?: string }[];
  nodes: { id: string; x: number; y: number; elevation: number }[];
  pipes: { id: string; from: string; to: string; outsideDiameter: number; insideDiameter: number }[];
}
export interface HookFitting {
  node: string;
  mark: string;
  kind: string;
  thrust: [number, number, number];
  horizontalThrust: number;
  governingCase: string;
  cases: { case: string; pressure: number; total: [number, number, number] }[];
  restraint: { block: { bearingArea: number } | null };
  pipes: { id: string; outsideDiameter: number }[];
}

type Hook = {
  project(): HookProject;
  schedule(): { fittings: HookFitting[] };
  selection(): { nodes: string[]; pipes: string[] };
  viewport(): { scale: number; left: number; top: number };
  canUndo(): boolean;
};

/** The app as a user drives it, with plan points given in metres. */
export class MainbracePage {
  constructor(readonly page: Page) {}

  /** Opens the app with empty storage, so the demo project loads. */
  async gotoFresh() {
    await this.page.goto('/');
    await this.page.evaluate(
      () =>
        new Promise((resolve) => {
          const q = indexedDB.deleteDatabase('keyval-store');
          q.onsuccess = q.onerror = q.onblocked = () => resolve(null);
        }),
    );
    await this.page.reload();
    await this.ready();
  }

  async ready() {
    await this.page.waitForFunction(
      () => (window as unknown as { __mainbrace?: Hook }).__mainbrace?.project().nodes.length !== undefined,
    );
    await expect(this.page.getByTestId('plan')).toBeVisible();
  }

  project(): Promise<HookProject> {
    return this.page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.project());
  }

  schedule(): Promise<{ fittings: HookFitting[] }> {
    return this.page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.schedule());
  }

  async fitting(node: string): Promise<HookFitting> {
    const f = (await this.schedule()).fittings.find((x) => x.node === node);
    if (!f) throw new Error(`no fitting at ${node}`);
    return f;
  }

  /** Page coordinates of a plan point (m), through the app's own viewport. */
  async toPage(x: number, y: number): Promise<{ x: number; y: number }> {
    const box = (await this.page.getByTestId('plan').boundingBox())!;
    const v = await this.page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.viewport());
    return { x: box.x + (x - v.left) * v.scale, y: box.y + (v.top - y) * v.scale };
  }

  async clickPlan(x: number, y: number) {
    const p = await this.toPage(x, y);
    await this.page.mouse.click(p.x, p.y);
  }

  async newProject() {
    await this.page.getByRole('button', { name: 'New', exact: true }).click();
    await expect.poll(async () => (await this.project()).nodes.length).toBe(0);
  }

  /** A fresh app with a new, empty project in the default view and snapping off: ready to draw. */
  async blankCanvas() {
    await this.gotoFresh();
    await this.newProject();
    await this.tool('fit');
    await this.snapping(false);
  }

  async tool(name: 'select' | 'draw' | 'pan' | 'fit' | 'snap') {
    await this.page.getByTestId(`tool-${name}`).click();
  }

  async snapping(on: boolean) {
    const pressed = (await this.page.getByTestId('tool-snap').getAttribute('aria-pressed')) === 'true';
    if (pressed !== on) await this.tool('snap');
  }

  /** Draws a run through plan points (m) with the draw tool and finishes it with Enter. */
  async draw(points: [number, number][]) {
    await this.tool('draw');
    for (const [x, y] of points) await this.clickPlan(x, y);
    await this.page.keyboard.press('Enter');
    await this.tool('select');
  }

  /** Drags a node with the select tool to a plan point (m). */
  async dragNode(id: string, to: [number, number]) {
    const n = (await this.project()).nodes.find((x) => x.id === id)!;
    await this.tool('select');
    const a = await this.toPage(n.x, n.y);
    const b = await this.toPage(to[0], to[1]);
    await this.page.mouse.move(a.x, a.y);
    await this.page.mouse.down();
    await this.page.mouse.move(b.x, b.y, { steps: 12 });
    await this.page.mouse.up();
  }

  async selectNode(id: string) {
    const n = (await this.project()).nodes.find((x) => x.id === id)!;
    await this.tool('select');
    await this.clickPlan(n.x, n.y);
    await expect
      .poll(async () =>
        this.page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.selection().nodes),
      )
      .toEqual([id]);
  }

  async undo() {
    await this.page.getByTestId('plan').focus();
    await this.page.keyboard.press('Control+z');
  }

  async redo() {
    await this.page.getByTestId('plan').focus();
    await this.page.keyboard.press('Control+Shift+z');
  }

  async openFile(path: string) {
    await this.page.getByTestId('open-file').setInputFiles(path);
  }

  async drawerTab(tab: 'schedule' | 'profile' | 'cases' | 'soils' | 'sheet') {
    await this.page.getByTestId(`tab-${tab}`).click();
    // the tabs after the schedule load in chunks of their own: wait until the chosen one is shown
    await expect(this.page.getByTestId('drawer-body').getByText(/^Loading /)).toHaveCount(0);
  }

  /** Chooses an item of the Export menu and returns the downloaded file's text. */
  async exportText(item: 'Schedule as CSV' | 'Schedule as JSON'): Promise<string> {
    await this.page.getByRole('button', { name: 'Export ▾' }).click();
    const [download] = await Promise.all([
      this.page.waitForEvent('download'),
      this.page.getByRole('menuitem', { name: item }).click(),
    ]);
    const path = await download.path();
    const { readFileSync } = await import('node:fs');
    return readFileSync(path!, 'utf8');
  }

  async shot(name: string) {
    await this.page.screenshot({ path: `artifacts/${name}.png` });
  }
}

/** Gauge pressure at a node for a case: p = p_case + ρ·g·(datum − z), ρ = 998.2 kg/m³, g = 9.80665 m/s². */
export function pressureAt(c: HookProject['loadCases'][number], z: number): number {
  return c.pressure + (c.datumElevation === undefined ? 0 : 998.2 * 9.80665 * (c.datumElevation - z));
}

export const magnitude = (v: readonly number[]) => Math.hypot(v[0]!, v[1]!, v[2]!);
