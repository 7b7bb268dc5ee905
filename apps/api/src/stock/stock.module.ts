import { Module } from '@nestjs/common';

/** Stock: see DEVELOPERS.md for what lives here. */
@Module({})
export class StockModule {}
