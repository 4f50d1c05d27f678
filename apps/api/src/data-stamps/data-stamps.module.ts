import { Global, Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { DataStampsInterceptor } from './data-stamps.interceptor';
import { DataStampsService } from './data-stamps.service';

/** Data stamps: which scope changed since an answer was computed, shared by every API instance. */
@Global()
@Module({
  providers: [DataStampsService, { provide: APP_INTERCEPTOR, useClass: DataStampsInterceptor }],
  exports: [DataStampsService],
})
export class DataStampsModule {}
