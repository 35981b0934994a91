import { SlurryFormScreen } from '@/components/forms/slurry-form';

export default function NewSlurryRoute() {
  return <SlurryFormScreen />;
}
