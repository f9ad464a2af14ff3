// Konva's core as the plan uses it, put in place of `konva/lib/Core.js` (vite.config.ts), which
// react-konva reads its node classes from by name. The plan draws with a Stage, Layers and Shapes;
// Konva's own core entry adds Animation, Tween and FastLayer, which nothing here uses (docs/performance.md:
// 2.6 kB gzipped of the first load). Group stays: react-konva falls back to it for an unknown name.
import { Konva as Global } from 'konva/lib/Global.js';
import { Util, Transform } from 'konva/lib/Util.js';
import { Node } from 'konva/lib/Node.js';
import { Container } from 'konva/lib/Container.js';
import { Stage, stages } from 'konva/lib/Stage.js';
import { Layer } from 'konva/lib/Layer.js';
import { Group } from 'konva/lib/Group.js';
import { DD } from 'konva/lib/DragAndDrop.js';
import { Shape, shapes } from 'konva/lib/Shape.js';
import { Context } from 'konva/lib/Context.js';
import { Canvas } from 'konva/lib/Canvas.js';

export const Konva = Util._assign(Global, {
  // what react-konva wraps each commit in, as Konva's own core entry exposes it
  beginUpdateBatch: Node._beginUpdateBatch,
  Util,
  Transform,
  Node,
  Container,
  Stage,
  stages,
  Layer,
  Group,
  DD,
  Shape,
  shapes,
  Context,
  Canvas,
});
export default Konva;
