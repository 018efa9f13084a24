/** Units: SI <-> IP conversion and formatting for everything the product shows. Imports nothing outside lib/units. */
export * from '@/lib/units/definitions';
export * from '@/lib/units/quantities';
export * from '@/lib/units/format';
