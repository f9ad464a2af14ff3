import { ProjectSoils } from './ProjectSoils.js';
import { SoilClassPicker } from './SoilClassPicker.js';
import { BeddingAndWrap } from './BeddingAndWrap.js';
import { DesignSettings } from './DesignSettings.js';

/**
 * The ground and the design settings: the project's soils with their sources and the built-in classes
 * to copy from; then bedding and wrap, blocks and anchors, water and ground.
 */
export function SoilsPanel() {
  return (
    <div className="soils-panel">
      <section className="settings-group" aria-labelledby="soils-title">
        <h4 id="soils-title">Soils</h4>
        <ProjectSoils />
        <SoilClassPicker />
      </section>
      <div className="design-settings" aria-label="Design settings">
        <BeddingAndWrap />
        <DesignSettings />
      </div>
    </div>
  );
}
