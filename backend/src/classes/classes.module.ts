import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ClassesController } from './classes.controller';
import { ClassesService } from './classes.service';
import { ClassMember } from './entities/class-member.entity';
import { Invitation } from './entities/invitation.entity';
import { StudioClass } from './entities/studio-class.entity';
import { InvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';

@Module({
  imports: [TypeOrmModule.forFeature([StudioClass, ClassMember, Invitation])],
  controllers: [ClassesController, InvitationsController],
  providers: [ClassesService, InvitationsService],
  exports: [ClassesService],
})
export class ClassesModule {}
