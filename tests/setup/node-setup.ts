// TypeORM's decorators read metadata through reflect-metadata.
import 'reflect-metadata';
