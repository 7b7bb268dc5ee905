import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Material } from '../catalogue/entities/material.entity';
import { SuppliersModule } from '../suppliers/suppliers.module';
import { CostingService } from './costing.service';

/**
 * Costing: a take-off mapped to catalogue materials (read with its own repository: it needs every
 * material of a few kinds at once), packed and priced at SuppliersService's current prices.
 */
@Module({
  imports: [TypeOrmModule.forFeature([Material]), SuppliersModule],
  providers: [CostingService],
  exports: [CostingService],
})
export class CostingModule {}
