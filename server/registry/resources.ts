import type { ObjectLiteral } from 'typeorm';
import { connectorDef } from './connectors/connector.def';
import { dipTubeDef } from './dip-tubes/dip-tube.def';
import { drumTypeDef } from './drum-types/drum-type.def';
import { keyCodeDef } from './key-codes/key-code.def';
import { pairingDef } from './pairings/pairing.def';
import type { ResourceDef } from './resource';
import { slurryDef } from './slurries/slurry.def';
import { stationDef } from './stations/station.def';
import { supplierDef } from './suppliers/supplier.def';
import { threadSpecDef } from './thread-specs/thread-spec.def';
import { tubeSetDef } from './tube-sets/tube-set.def';

/** Every registry resource, each defined in its own folder (server/registry/<resource>/); the generic paged CRUD in resource.ts serves them. */
export const RESOURCES = [supplierDef, threadSpecDef, keyCodeDef, drumTypeDef, dipTubeDef, connectorDef, pairingDef, slurryDef, stationDef, tubeSetDef] as unknown as ResourceDef<ObjectLiteral>[];
