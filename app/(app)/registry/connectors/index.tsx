import { ConnectorListScreen } from '@/components/registry/connector-list-screen';

export default ConnectorListScreen;
