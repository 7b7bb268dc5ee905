import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogueModule } from '../catalogue/catalogue.module';
import { Supplier } from './entities/supplier.entity';
import { SupplierContact } from './entities/supplier-contact.entity';
import { SupplierPrice } from './entities/supplier-price.entity';
import { SupplierPricesService } from './supplier-prices.service';
import { MaterialPricesController, SuppliersController } from './suppliers.controller';
import { SuppliersService } from './suppliers.service';

/** Suppliers: contacts, lead times, prices per pack with their history, price list CSV. */
@Module({
  imports: [TypeOrmModule.forFeature([Supplier, SupplierContact, SupplierPrice]), CatalogueModule],
  controllers: [SuppliersController, MaterialPricesController],
  providers: [SuppliersService, SupplierPricesService],
  exports: [SuppliersService],
})
export class SuppliersModule {}
