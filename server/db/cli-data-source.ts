/** Entry point for the TypeORM CLI (migration:generate / migration:run). */
import { loadConfig } from '../config.js';
import { createDataSource } from './data-source.js';

export default createDataSource(loadConfig().DATABASE_URL);
