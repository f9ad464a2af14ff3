import { useRef, useState } from 'react';
import { planDistance, type Underlay } from '@mainbrace/solver';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import { INLINE_LIMIT_BYTES, loadImageFile } from '../state/underlayFile.js';
import { useUnderlayImage, type ImageState } from '../state/useUnderlayImage.js';
import { calibrate, firstPlacement, type CalibrationInput } from '../state/underlayEdits.js';
import { parseLength } from '../format/typedEntry.js';
import { show } from '../format/quantity.js';

const megabytes = (b: number) => (b < 1048576 ? `${Math.ceil(b / 1024)} KB` : `${(b / 1048576).toFixed(1)} MB`);

/** Where the image is kept, in words: the user must know whether a saved file carries the picture. */
function keptWhere(u: Underlay, image: ImageState): string {
  const size = image.status === 'ready' && image.bytes !== null ? ` (${megabytes(image.bytes)})` : '';
  return u.dataUrl
    ? `The image${size} is kept inside the project file: a saved file carries it.`
    : `The image${size} is larger than ${megabytes(INLINE_LIMIT_BYTES)}, so it is kept in this browser’s storage beside the project: a saved file carries its placement and calibration but not the picture.`;
}

/**
 * The site plan under the route: load a PNG or JPEG, calibrate it by two picked points and the
 * distance between them (or their coordinates), set its opacity, lock it.
 */
export function UnderlayPanel() {
  const underlay = useApp((s) => s.project.underlay);
  const picks = useApp((s) => s.underlayPick);
  const units = useApp((s) => s.units);
  const store = useAppStore();
  const actions = useActions();
  const image = useUnderlayImage(underlay);
  const fileInput = useRef<HTMLInputElement>(null);
  const [method, setMethod] = useState<CalibrationInput['method']>('distance');
  const [distance, setDistance] = useState('');
  const [coords, setCoords] = useState(['', '', '', '']);
  const [message, setMessage] = useState<string | null>(null);

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    setMessage(null);
    const r = await loadImageFile(file);
    if (!r.ok) return setMessage(r.message);
    const s = store.getState();
    const same = s.project.underlay;
    // The same picture loaded again (its stored copy is not in this browser) keeps its calibration.
    const keep = same && same.width === r.image.width && same.height === r.image.height;
    const el = document.querySelector('[data-testid="plan"]');
    const canvas = { width: el?.clientWidth || 800, height: el?.clientHeight || 500 };
    const { dataUrl: _d, storageKey: _k, ...placed } = keep ? same : { opacity: 0.5, locked: false };
    actions.setUnderlay({
      ...(keep ? placed : { ...placed, ...firstPlacement(r.image.width, r.image.height, s.viewport, canvas) }),
      ...r.image,
    } as Underlay);
  };

  const apply = () => {
    if (!underlay || !picks) return;
    let input: CalibrationInput;
    if (method === 'distance') {
      const d = parseLength(distance, units);
      if (!d.ok) return setMessage(`Known distance: ${d.message}`);
      input = { method, distance: d.metres };
    } else {
      const names = ['Point 1 easting', 'Point 1 northing', 'Point 2 easting', 'Point 2 northing'];
      const values: number[] = [];
      for (let i = 0; i < 4; i++) {
        const r = parseLength(coords[i]!, units);
        if (!r.ok) return setMessage(`${names[i]}: ${r.message}`);
        values.push(r.metres);
      }
      input = {
        method,
        coordinates: [
          { x: values[0]!, y: values[1]! },
          { x: values[2]!, y: values[3]! },
        ],
      };
    }
    const r = calibrate(underlay, picks, input);
    if (!r.ok) return setMessage(r.message);
    setMessage(null);
    actions.setUnderlay(r.underlay);
  };

  const chooser = (
    <>
      <input
        ref={fileInput}
        type="file"
        accept="image/png,image/jpeg"
        hidden
        data-testid="underlay-file"
        onChange={(e) => {
          void onFile(e.target.files?.[0]);
          e.target.value = '';
        }}
      />
      <button type="button" onClick={() => fileInput.current?.click()} data-testid="underlay-load">
        {underlay ? 'Load another image…' : 'Load a site plan image…'}
      </button>
    </>
  );

  if (!underlay)
    return (
      <div className="underlay-panel">
        <section className="settings-group">
          <h4>Site plan</h4>
          <p className="muted">
            Put a site plan (PNG or JPEG) under the route, calibrate it by two points, and trace the main over it. An
            image up to {megabytes(INLINE_LIMIT_BYTES)} is kept inside the project file; a larger one in this browser’s
            storage beside the project.
          </p>
          {chooser}
          {message && (
            <p className="field-error" role="alert">
              {message}
            </p>
          )}
        </section>
      </div>
    );

  const locked = underlay.locked;
  const cal = underlay.calibration;
  const measured = picks?.length === 2 ? planDistance(underlay, picks[0]!, picks[1]!) : null;
  return (
    <div className="underlay-panel">
      <section className="settings-group" aria-labelledby="underlay-title">
        <h4 id="underlay-title">Site plan</h4>
        <p>
          <span className="strong">{underlay.name}</span>{' '}
          <span className="muted">
            {underlay.width} × {underlay.height} px
          </span>
        </p>
        <p className="muted small" data-testid="underlay-kept">
          {keptWhere(underlay, image)}
        </p>
        {image.status === 'missing' && (
          <p className="field-error" role="alert">
            The picture is not here: {image.message}. Load the same image again to see it; its calibration is kept.
          </p>
        )}
        <div className="field">
          <label htmlFor="underlay-opacity">Opacity {Math.round(underlay.opacity * 100)} %</label>
          <input
            id="underlay-opacity"
            type="range"
            min={0}
            max={100}
            step={5}
            value={Math.round(underlay.opacity * 100)}
            data-testid="underlay-opacity"
            onPointerDown={actions.beginLiveEdit}
            onKeyDown={actions.beginLiveEdit}
            onPointerUp={actions.endLiveEdit}
            onKeyUp={actions.endLiveEdit}
            onBlur={actions.endLiveEdit}
            onChange={(e) =>
              actions.liveEdit((p) =>
                p.underlay ? { ...p, underlay: { ...p.underlay, opacity: Number(e.target.value) / 100 } } : p,
              )
            }
          />
        </div>
        <label className="check">
          <input
            type="checkbox"
            checked={locked}
            data-testid="underlay-lock"
            onChange={(e) => actions.updateUnderlay({ locked: e.target.checked })}
          />{' '}
          Locked (not moved or calibrated by mistake)
        </label>
        <div className="underlay-buttons">
          {chooser}
          <button type="button" className="danger" onClick={() => actions.setUnderlay(undefined)}>
            Remove
          </button>
        </div>
      </section>
      <section className="settings-group" aria-labelledby="calibration-title">
        <h4 id="calibration-title">Calibration</h4>
        <p className="muted small" data-testid="underlay-scale">
          {show(underlay.metresPerPixel * 100, 'length', units, 4)} per 100 px, turned {round2(underlay.rotation)}°
          {cal
            ? cal.method === 'distance'
              ? ` — calibrated by two points ${show(cal.distance ?? 0, 'length', units, 5)} apart`
              : ' — calibrated by two known coordinates'
            : ' — not calibrated yet'}
        </p>
        {locked ? (
          <p className="muted">Unlock the site plan to calibrate it.</p>
        ) : (
          <>
            <div className="field" role="radiogroup" aria-label="Calibrate by">
              <label className="check">
                <input
                  type="radio"
                  name="calibration-method"
                  checked={method === 'distance'}
                  onChange={() => setMethod('distance')}
                />{' '}
                Two points and the distance between them
              </label>
              <label className="check">
                <input
                  type="radio"
                  name="calibration-method"
                  checked={method === 'coordinates'}
                  onChange={() => setMethod('coordinates')}
                  data-testid="calibrate-by-coordinates"
                />{' '}
                Two points with known coordinates
              </label>
            </div>
            {picks === null ? (
              <button type="button" onClick={actions.startUnderlayPick} data-testid="calibrate-pick">
                Pick two points on the plan
              </button>
            ) : (
              <p className="small" role="status" data-testid="calibrate-status">
                {picks.length < 2
                  ? `Click point ${picks.length + 1} of 2 on the image (zoom in for precision).`
                  : `Two points picked, ${show(measured ?? 0, 'length', units, 5)} apart as the image is scaled now.`}{' '}
                <button type="button" className="link small" onClick={actions.cancelUnderlayPick}>
                  {picks.length < 2 ? 'Cancel' : 'Pick again'}
                </button>
              </p>
            )}
            {method === 'distance' ? (
              <div className="field">
                <label htmlFor="calibrate-distance">Known distance between them</label>
                <input
                  id="calibrate-distance"
                  value={distance}
                  inputMode="decimal"
                  placeholder={units === 'us' ? `e.g. 120 ft or 36.58 m` : 'e.g. 40 or 40 m'}
                  onChange={(e) => setDistance(e.target.value)}
                  onKeyDown={(e) => e.key === 'Enter' && apply()}
                  data-testid="calibrate-distance"
                />
              </div>
            ) : (
              <div className="field-row">
                {['Point 1 E', 'Point 1 N', 'Point 2 E', 'Point 2 N'].map((label, i) => (
                  <div className="field" key={label}>
                    <label htmlFor={`calibrate-c${i}`}>{label}</label>
                    <input
                      id={`calibrate-c${i}`}
                      value={coords[i]}
                      inputMode="decimal"
                      onChange={(e) => setCoords(coords.map((c, j) => (j === i ? e.target.value : c)))}
                      data-testid={`calibrate-c${i}`}
                    />
                  </div>
                ))}
              </div>
            )}
            <button
              type="button"
              onClick={apply}
              disabled={picks?.length !== 2}
              data-testid="calibrate-apply"
              title={picks?.length === 2 ? undefined : 'Pick two points on the plan first'}
            >
              Calibrate
            </button>
          </>
        )}
        {message && (
          <p className="field-error" role="alert">
            {message}
          </p>
        )}
      </section>
    </div>
  );
}

const round2 = (x: number) => Math.round(x * 100) / 100;
