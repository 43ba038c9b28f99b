import { Panel } from './Panel';

/** The oil temperature × load sweep comes in a later issue; its place on the sheet is kept. */
export function MapPanel() {
  return (
    <Panel id="map" title="Map" className="panel--placeholder">
      <p className="note">The oil temperature × load sweep will appear here.</p>
    </Panel>
  );
}
