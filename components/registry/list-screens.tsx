// The registry's list screens, one chunk: with the table library (@tanstack/react-table) they are loaded
// through `lazy-lists.tsx` only, so none of it weighs on the first load of another screen (the dock).
export { ConnectorListScreen } from './connector-list-screen';
export { DipTubeListScreen } from './dip-tube-list-screen';
export { DrumTypeListScreen } from './drum-type-list-screen';
export { PairingListScreen } from './pairing-list-screen';
export { SlurryListScreen } from './slurry-list-screen';
export { SupplierListScreen } from './supplier-list-screen';
