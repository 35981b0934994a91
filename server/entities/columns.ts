import { Column, type ColumnOptions } from 'typeorm';

// Column helpers with explicit types (see DEVELOPERS.md: no reliance on decorator metadata).
// Lengths are stored in mm as double precision, which PostgreSQL returns as a JS number.
export const Float = (name: string, options: ColumnOptions = {}) => Column({ name, type: 'double precision', ...options });
export const NullableFloat = (name: string) => Column({ name, type: 'double precision', nullable: true });
export const Text = (name: string, length = 200, options: ColumnOptions = {}) => Column({ name, type: 'varchar', length, ...options });
export const NullableText = (name: string, length = 200) => Column({ name, type: 'varchar', length, nullable: true });
export const Uuid = (name: string) => Column({ name, type: 'uuid' });
export const NullableUuid = (name: string) => Column({ name, type: 'uuid', nullable: true });
export const Bool = (name: string, defaultValue = false) => Column({ name, type: 'boolean', default: defaultValue });
