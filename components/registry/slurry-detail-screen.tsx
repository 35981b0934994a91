import { HandlingCaution } from '../ui/handling-caution';
import { registryDetail, FactLink, FactList, Section } from './detail-parts';
import { regionLabel } from './labels';

export const SlurryDetailScreen = registryDetail('slurries', {
  title: (s) => s.name,
  subtitle: (s) => `${s.supplierName ?? 'unknown supplier'} · ${regionLabel(s.region)}`,
  columns: (s) => [
    <Section title="Slurry" testID="slurry-facts">
      <FactList
        facts={[
          { label: 'Supplier', value: s.supplierName ? <FactLink href={`/registry/suppliers/${s.supplierId}`} label={s.supplierName} /> : '—' },
          { label: 'Region', value: regionLabel(s.region) },
          {
            label: 'Arrives in',
            value: <FactLink href={`/registry/drum-types/${s.drumTypeId}`} label={s.drumTypeName ?? 'its drum type'} testID="slurry-drum-link" />,
          },
          { label: 'Solids', value: `${s.solidsWtPct} wt%` },
          { label: 'Foams when stirred', value: s.foams ? 'Yes: recirculate by pump, not by a mechanical stirrer' : 'No' },
          { label: 'Shear-sensitive', value: s.shearSensitive ? 'Yes: keep return velocities low' : 'No' },
          { label: 'Shelf life', value: s.shelfLifeDays !== null ? `${s.shelfLifeDays} days from production` : 'Not registered' },
          { label: 'Minimum life on arrival', value: s.minRemainingDays !== null ? `${s.minRemainingDays} days` : 'Not registered' },
          { label: 'Storage', value: s.storageMinC !== null && s.storageMaxC !== null ? `${s.storageMinC} to ${s.storageMaxC} °C` : 'Not registered' },
          { label: 'Certificate of analysis', value: s.certificateRequired ? 'Required at the dock: a lot without it is held' : 'Not required' },
        ]}
      />
    </Section>,
    <HandlingCaution />,
  ],
});
