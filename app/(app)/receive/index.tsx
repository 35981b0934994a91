import { DockCheckScreen } from '@/components/receive/dock-check-screen';

export default DockCheckScreen;
