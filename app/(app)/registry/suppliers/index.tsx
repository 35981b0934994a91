import { SupplierListScreen } from '@/components/registry/supplier-list-screen';

export default SupplierListScreen;
