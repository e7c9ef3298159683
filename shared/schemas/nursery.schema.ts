/**
 * The nursery ledger's schemas, split by topic; this file re-exports them so that imports of
 * `nursery.schema` keep working. New code may import the topic file it needs.
 */
export * from './nursery-rules.schema.js';
export * from './nursery-batch.schema.js';
export * from './nursery-tree.schema.js';
export * from './nursery-tank.schema.js';
export * from './nursery-readiness.schema.js';
