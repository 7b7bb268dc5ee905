import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildUpsController } from './build-ups.controller';
import { BuildUpsService } from './build-ups.service';
import { BuildUp } from './entities/build-up.entity';

/** Build-ups: the owner's named sets of rates for the costing engine. Registered through JobsModule. */
@Module({
  imports: [TypeOrmModule.forFeature([BuildUp])],
  controllers: [BuildUpsController],
  providers: [BuildUpsService],
  exports: [BuildUpsService],
})
export class BuildUpsModule {}
