import { useLocalSearchParams } from 'expo-router';
import { DipTubeFormScreen } from '@/components/forms/dip-tube-form';

export default function EditDipTubeRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <DipTubeFormScreen id={id} />;
}
