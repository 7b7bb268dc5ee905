import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogueController } from './catalogue.controller';
import { CatalogueService } from './catalogue.service';
import { Material } from './entities/material.entity';

/** Catalogue: the materials a company stocks, their packs, storage, hazards and CSV import/export. */
@Module({
  imports: [TypeOrmModule.forFeature([Material])],
  controllers: [CatalogueController],
  providers: [CatalogueService],
  exports: [CatalogueService],
})
export class CatalogueModule {}
