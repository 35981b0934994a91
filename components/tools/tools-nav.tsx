import { SectionTabs, type SectionTab } from '../registry/section-tabs';

export const TOOL_TABS: readonly SectionTab[] = [
  { href: '/tools/thread', label: 'Thread identifier', testID: 'tools-nav-thread' },
  { href: '/tools/flow', label: 'Flow and shear', testID: 'tools-nav-flow' },
  { href: '/tools/packaging-code', label: 'Packaging code', testID: 'tools-nav-packaging-code' },
];

/** Moves between the three calculators. */
export function ToolsNav() {
  return <SectionTabs label="Tools" tabs={TOOL_TABS} />;
}
