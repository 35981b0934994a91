import { lazyList } from '@/components/registry/lazy-lists';

export default lazyList('SupplierListScreen');
