import { Module } from '@nestjs/common';

/** Suppliers: see DEVELOPERS.md for what lives here. */
@Module({})
export class SuppliersModule {}
