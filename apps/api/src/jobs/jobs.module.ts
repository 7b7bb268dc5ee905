import { Module } from '@nestjs/common';

/** Jobs: see DEVELOPERS.md for what lives here. */
@Module({})
export class JobsModule {}
