import { RegistryNav } from '@/components/registry/registry-nav';
import { SectionLayout } from '@/components/ui/section-layout';

export default function RegistryLayout() {
  return <SectionLayout nav={<RegistryNav />} />;
}
