import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { FilesModule } from '../files/files.module';
import { CountsController } from './counts.controller';
import { CountsService } from './counts.service';
import { IdempotencyKeyRecord } from './entities/idempotency-key.entity';
import { Location } from './entities/location.entity';
import { LotBalance } from './entities/lot-balance.entity';
import { LotEvent } from './entities/lot-event.entity';
import { Lot } from './entities/lot.entity';
import { ReceiptLine } from './entities/receipt-line.entity';
import { Receipt } from './entities/receipt.entity';
import { StockCountLine } from './entities/stock-count-line.entity';
import { StockCount } from './entities/stock-count.entity';
import { StockMovement } from './entities/stock-movement.entity';
import { TemperatureReading } from './entities/temperature-reading.entity';
import { ExposureService } from './exposure.service';
import { IdempotencyService } from './idempotency.service';
import { LedgerService } from './ledger.service';
import { LocationsController } from './locations.controller';
import { LocationsService } from './locations.service';
import { LotsController } from './lots.controller';
import { LotsService } from './lots.service';
import { MovementsController } from './movements.controller';
import { MovementsService } from './movements.service';
import { ReceiptsController } from './receipts.controller';
import { ReceiptsService } from './receipts.service';
import { ReceivingService } from './receiving.service';
import { StockReader } from './stock-reader.service';
import { StockController } from './stock.controller';
import { StockService } from './stock.service';
import { TemperaturesController } from './temperatures.controller';
import { TemperaturesService } from './temperatures.service';

/**
 * Stock: locations, lots, the stock ledger, receipts, counts, temperatures and hazards.
 * Exports StockService (issues, returns and FEFO locks for jobs), IdempotencyService (for every
 * stock-changing request elsewhere) and ReceivingService (for purchasing: receipts against order lines).
 */
@Module({
  imports: [
    TypeOrmModule.forFeature([
      Location,
      Lot,
      LotBalance,
      LotEvent,
      StockMovement,
      Receipt,
      ReceiptLine,
      StockCount,
      StockCountLine,
      TemperatureReading,
      IdempotencyKeyRecord,
    ]),
    FilesModule,
  ],
  controllers: [StockController, LocationsController, LotsController, MovementsController, ReceiptsController, CountsController, TemperaturesController],
  providers: [
    LedgerService,
    MovementsService,
    StockReader,
    StockService,
    IdempotencyService,
    LocationsService,
    LotsService,
    ReceivingService,
    ReceiptsService,
    CountsService,
    ExposureService,
    TemperaturesService,
  ],
  exports: [StockService, IdempotencyService, ReceivingService],
})
export class StockModule {}
