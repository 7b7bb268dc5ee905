import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Material } from '../catalogue/entities/material.entity';
import { CostingService } from './costing.service';

/**
 * Costing: a take-off mapped to catalogue materials, packed and priced. Reads materials and
 * supplier prices itself until the catalogue and suppliers services offer the same.
 */
@Module({
  imports: [TypeOrmModule.forFeature([Material])],
  providers: [CostingService],
  exports: [CostingService],
})
export class CostingModule {}
