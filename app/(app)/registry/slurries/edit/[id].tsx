import { useLocalSearchParams } from 'expo-router';
import { SlurryFormScreen } from '@/components/forms/slurry-form';

export default function EditSlurryRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SlurryFormScreen id={id} />;
}
