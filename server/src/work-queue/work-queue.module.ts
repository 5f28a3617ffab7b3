import { Module } from '@nestjs/common';
import { WorkQueueController } from './work-queue.controller.js';
import { WorkQueueRepository } from './work-queue.repository.js';
import { WorkQueueService } from './work-queue.service.js';

@Module({ controllers: [WorkQueueController], providers: [WorkQueueRepository, WorkQueueService] })
export class WorkQueueModule {}
