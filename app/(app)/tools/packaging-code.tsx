import { PackagingCodeScreen } from '@/components/tools/packaging-code-screen';

export default PackagingCodeScreen;
