import { DipTubeListScreen } from '@/components/registry/dip-tube-list-screen';

export default DipTubeListScreen;
