import { Module } from '@nestjs/common';
import { SessionPool } from './session-pool';

@Module({ providers: [SessionPool], exports: [SessionPool] })
export class SessionModule {}
