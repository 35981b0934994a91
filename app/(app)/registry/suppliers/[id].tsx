import { useLocalSearchParams } from 'expo-router';
import { SupplierDetailScreen } from '@/components/registry/supplier-detail-screen';

export default function SupplierDetailRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SupplierDetailScreen id={id} />;
}
