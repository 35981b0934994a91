import { SlurryListScreen } from '@/components/registry/slurry-list-screen';

export default SlurryListScreen;
