import { PairingListScreen } from '@/components/registry/pairing-list-screen';

export default PairingListScreen;
