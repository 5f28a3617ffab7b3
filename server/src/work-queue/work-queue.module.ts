import { Module } from '@nestjs/common';
import { WorkQueueController } from './work-queue.controller.js';
import { WorkQueueService } from './work-queue.service.js';

@Module({ controllers: [WorkQueueController], providers: [WorkQueueService] })
export class WorkQueueModule {}
