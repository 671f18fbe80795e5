import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { CreateClassInput, UpdateClassInput } from '@mixmark/common';
import { DataSource, IsNull, Repository } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import { User } from '../users/entities/user.entity';
import { newClassCode } from './class-code';
import { ClassMember } from './entities/class-member.entity';
import { StudioClass } from './entities/studio-class.entity';

export interface ClassSummary {
  id: string;
  name: string;
  code: string | null;
  teacher: { id: string; displayName: string };
  archived: boolean;
  studentCount: number;
  createdAt: Date;
}

export interface RosterEntry {
  id: string;
  displayName: string;
  email: string;
  joinedAt: Date;
}

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no class with this id.' });

@Injectable()
export class ClassesService {
  constructor(
    @InjectRepository(StudioClass) private readonly classesRepository: Repository<StudioClass>,
    @InjectRepository(ClassMember) private readonly membersRepository: Repository<ClassMember>,
    private readonly dataSource: DataSource,
  ) {}

  async create(teacher: AuthUser, input: CreateClassInput): Promise<ClassSummary> {
    const owner = await this.dataSource.getRepository(User).findOneByOrFail({ id: teacher.id });
    // A clash of random codes is rare (6 characters of 31): try again a few times.
    for (let tries = 0; tries < 5; tries += 1) {
      const code = newClassCode();
      const saved = await this.classesRepository
        .save(this.classesRepository.create({ name: input.name, teacherId: teacher.id, studioId: owner.studioId, code }))
        .catch((error: { code?: string }) => (error.code === '23505' ? undefined : Promise.reject(error)));
      if (saved) return this.findOne(teacher, saved.id);
    }
    throw new ConflictException({ code: 'conflict', message: 'Could not make a unique class code; please try again.' });
  }

  /** Teachers see the classes they run; students the classes they are on. */
  async findAll(caller: AuthUser, { includeArchived = false } = {}): Promise<ClassSummary[]> {
    const query = this.summaryQuery();
    if (caller.role === 'student') {
      query.innerJoin(ClassMember, 'me', 'me.class_id = c.id AND me.student_id = :caller', { caller: caller.id });
    } else if (caller.role === 'teacher') {
      query.where('c.teacher_id = :caller', { caller: caller.id });
    }
    if (!includeArchived) query.andWhere('c.archived_at IS NULL');
    const rows = await query.orderBy('c.created_at', 'DESC').getRawMany();
    return rows.map((row) => this.toSummary(row, caller));
  }

  async findOne(caller: AuthUser, id: string): Promise<ClassSummary> {
    const row = await this.summaryQuery().where('c.id = :id', { id }).getRawOne();
    if (!row || !(await this.canSee(caller, row.c_id, row.c_teacher_id))) throw notFound();
    return this.toSummary(row, caller);
  }

  async update(teacher: AuthUser, id: string, input: UpdateClassInput): Promise<ClassSummary> {
    const klass = await this.findOwned(teacher, id);
    if (input.name !== undefined) klass.name = input.name;
    if (input.archived !== undefined) klass.archivedAt = input.archived ? (klass.archivedAt ?? new Date()) : null;
    await this.classesRepository.save(klass);
    return this.findOne(teacher, id);
  }

  async roster(teacher: AuthUser, id: string): Promise<RosterEntry[]> {
    await this.findOwned(teacher, id);
    return this.dataSource
      .createQueryBuilder()
      .select(['u.id AS id', 'u.display_name AS "displayName"', 'u.email AS email', 'm.joined_at AS "joinedAt"'])
      .from(ClassMember, 'm')
      .innerJoin(User, 'u', 'u.id = m.student_id')
      .where('m.class_id = :id', { id })
      .orderBy('u.display_name', 'ASC')
      .getRawMany<RosterEntry>();
  }

  async removeStudent(teacher: AuthUser, id: string, studentId: string): Promise<void> {
    await this.findOwned(teacher, id);
    const result = await this.membersRepository.delete({ classId: id, studentId });
    if (!result.affected) throw new NotFoundException({ code: 'not_found', message: 'This student is not on the class roster.' });
  }

  /** Joins a student to the class with this code (idempotent). */
  async join(student: AuthUser, code: string): Promise<ClassSummary> {
    const klass = await this.classesRepository.findOneBy({ code, archivedAt: IsNull() });
    if (!klass) {
      throw new NotFoundException({ code: 'class_code_unknown', message: 'No open class has this code. Check it with your teacher.', details: { code: 'unknown' } });
    }
    await this.addMember(klass.id, student.id);
    return this.findOne(student, klass.id);
  }

  async addMember(classId: string, studentId: string): Promise<void> {
    await this.membersRepository.createQueryBuilder().insert().values({ classId, studentId }).orIgnore().execute();
  }

  /** The class if this teacher runs it (admins run every class); otherwise a 404. */
  async findOwned(teacher: AuthUser, id: string): Promise<StudioClass> {
    const klass = await this.classesRepository.findOneBy({ id });
    if (!klass || (teacher.role !== 'admin' && klass.teacherId !== teacher.id)) throw notFound();
    return klass;
  }

  isMember(studentId: string, classId: string): Promise<boolean> {
    return this.membersRepository.existsBy({ studentId, classId });
  }

  private async canSee(caller: AuthUser, classId: string, teacherId: string): Promise<boolean> {
    if (caller.role === 'admin' || caller.id === teacherId) return true;
    return caller.role === 'student' && this.isMember(caller.id, classId);
  }

  private summaryQuery() {
    return this.classesRepository
      .createQueryBuilder('c')
      .innerJoin(User, 't', 't.id = c.teacher_id')
      .select('c.id', 'c_id')
      .addSelect('c.name', 'c_name')
      .addSelect('c.code', 'c_code')
      .addSelect('c.teacher_id', 'c_teacher_id')
      .addSelect('c.archived_at', 'c_archived_at')
      .addSelect('c.created_at', 'c_created_at')
      .addSelect('t.display_name', 't_display_name')
      .addSelect((sub) => sub.select('count(*)::int').from(ClassMember, 'cm').where('cm.class_id = c.id'), 'student_count');
  }

  private toSummary(row: Record<string, unknown>, caller: AuthUser): ClassSummary {
    const teaches = caller.role === 'admin' || caller.id === row.c_teacher_id;
    return {
      id: row.c_id as string,
      name: row.c_name as string,
      // Only the teacher hands out the code; students already joined.
      code: teaches ? (row.c_code as string) : null,
      teacher: { id: row.c_teacher_id as string, displayName: row.t_display_name as string },
      archived: row.c_archived_at !== null,
      studentCount: row.student_count as number,
      createdAt: row.c_created_at as Date,
    };
  }
}
