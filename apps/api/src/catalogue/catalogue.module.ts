import { Module } from '@nestjs/common';

/** Catalogue: see DEVELOPERS.md for what lives here. */
@Module({})
export class CatalogueModule {}
