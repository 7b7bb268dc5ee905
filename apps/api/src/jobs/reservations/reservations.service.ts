import { Injectable } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import type { Estimate } from '../entities/estimate.entity';
import type { Job } from '../entities/job.entity';

/** Stock held for a job's date. */
@Injectable()
export class ReservationsService {
  /** Called inside the status change's transaction. */
  async onStatusChange(_m: EntityManager, _job: Job): Promise<void> {}

  /** Called inside the acceptance's transaction, before the estimate becomes the accepted one. */
  async beforeAccept(_m: EntityManager, _job: Job, _e: Estimate): Promise<void> {}
}
