import { ConnectorFormScreen } from '@/components/forms/connector-form';

export default function NewConnectorRoute() {
  return <ConnectorFormScreen />;
}
