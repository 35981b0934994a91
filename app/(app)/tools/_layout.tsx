import { ToolsNav } from '@/components/tools/tools-nav';
import { SectionLayout } from '@/components/ui/section-layout';

export default function ToolsLayout() {
  return <SectionLayout nav={<ToolsNav />} />;
}
