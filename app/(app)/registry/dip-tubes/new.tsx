import { DipTubeFormScreen } from '@/components/forms/dip-tube-form';

export default function NewDipTubeRoute() {
  return <DipTubeFormScreen />;
}
