import { EntitySchema } from 'typeorm';

/** One fabrication shop. Every other row belongs to exactly one. */
export interface Organisation {
  id: string;
  /** Natural key for seeding. */
  slug: string;
  name: string;
  createdAt: Date;
  updatedAt: Date;
}

// EntitySchema rather than decorators: tsx and vitest transpile without decorator metadata.
export const OrganisationEntity = new EntitySchema<Organisation>({
  name: 'Organisation',
  tableName: 'organisation',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    slug: { type: 'text' },
    name: { type: 'text' },
    createdAt: { name: 'created_at', type: 'timestamptz', default: () => 'now()' },
    updatedAt: { name: 'updated_at', type: 'timestamptz', default: () => 'now()' },
  },
});
