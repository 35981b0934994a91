import { DrumTypeListScreen } from '@/components/registry/drum-type-list-screen';

export default DrumTypeListScreen;
