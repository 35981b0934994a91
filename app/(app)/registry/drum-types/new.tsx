import { DrumTypeFormScreen } from '@/components/forms/drum-type-form';

export default function NewDrumTypeRoute() {
  return <DrumTypeFormScreen />;
}
