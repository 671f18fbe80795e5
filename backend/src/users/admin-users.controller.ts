import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import { updateRoleSchema, type UpdateRoleInput } from '@mixmark/common';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import { toPublicUser, UsersService, type PublicUser } from './users.service';

/** Accounts and roles, for admins. */
@Roles('admin')
@Controller('admin/users')
export class AdminUsersController {
  constructor(private readonly usersService: UsersService) {}

  @Get()
  async findAll(): Promise<PublicUser[]> {
    return (await this.usersService.findAll()).map(toPublicUser);
  }

  @Patch(':id/role')
  async updateRole(
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(updateRoleSchema)) body: UpdateRoleInput,
  ): Promise<PublicUser> {
    return toPublicUser(await this.usersService.updateRole(id, body.role));
  }
}
