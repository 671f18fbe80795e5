import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { CreateDrillInput } from '@mixmark/common';
import { Brackets, DataSource, EntityManager, Repository } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import { Drill } from './entities/drill.entity';
import { normaliseTarget } from './normalise-target';

export type DrillScope = 'mine' | 'library' | 'all';

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no drill with this id.' });

@Injectable()
export class DrillsService {
  constructor(
    @InjectRepository(Drill) private readonly drillsRepository: Repository<Drill>,
    private readonly dataSource: DataSource,
  ) {}

  create(owner: AuthUser, input: CreateDrillInput): Promise<Drill> {
    return this.drillsRepository.save(this.drillsRepository.create({ ...this.fields(input), ownerId: owner.id }));
  }

  /**
   * `mine`: the caller's own drills; `library`: public drills; `all`: both, plus (for students)
   * the drills assigned to their classes.
   */
  findAll(caller: AuthUser, scope: DrillScope = 'all'): Promise<Drill[]> {
    const query = this.drillsRepository.createQueryBuilder('d').orderBy('d.created_at', 'DESC');
    if (scope === 'mine') query.where('d.owner_id = :caller', { caller: caller.id });
    else if (scope === 'library') query.where("d.visibility = 'public'");
    else query.where(this.visibleTo(caller));
    return query.getMany();
  }

  /** A drill the caller may see: their own, a public one, or one assigned to a class they are in or run. */
  async findVisible(caller: AuthUser, id: string): Promise<Drill> {
    const drill = await this.drillsRepository.createQueryBuilder('d').where('d.id = :id', { id }).andWhere(this.visibleTo(caller)).getOne();
    if (!drill) throw notFound();
    return drill;
  }

  /**
   * Replaces the drill's description. Once the drill has an assignment or an attempt, its kind
   * and its number of targets are fixed: they decide the printed card's layout (one window per
   * target) and what every past mark measured, so changing them is refused (409 `drill_in_use`)
   * and the teacher is pointed to a copy. Title, instructions, tolerance, palette, visibility
   * and the target colours themselves (same count) may still change.
   */
  async update(owner: AuthUser, id: string, input: CreateDrillInput): Promise<Drill> {
    await this.findOwned(owner, id);
    // The check and the write under one row lock: an attempt being recorded holds a shared lock
    // on the drill row (AttemptsService.create; an assignment's foreign key check takes the same
    // one), so either it commits first and the check below sees it, or it waits for this update.
    return this.dataSource.transaction(async (manager) => {
      const [locked] = await manager.query<{ id: string }[]>(`SELECT id FROM drills WHERE id = $1 AND deleted_at IS NULL FOR UPDATE`, [id]);
      if (!locked) throw notFound();
      const drill = await manager.getRepository(Drill).findOneByOrFail({ id });
      return this.applyUpdate(manager, drill, input);
    });
  }

  private async applyUpdate(manager: EntityManager, drill: Drill, input: CreateDrillInput): Promise<Drill> {
    const id = drill.id;
    const changed: Record<string, string> = {};
    if (input.kind !== drill.kind) changed.kind = 'drill_in_use';
    if (input.targets.length !== drill.targets.length) changed.targets = 'drill_in_use';
    if (Object.keys(changed).length > 0 && (await this.isInUse(manager, id))) {
      throw new ConflictException({
        code: 'drill_in_use',
        message:
          'This drill has already been assigned or attempted, so its kind and number of targets can no longer change: ' +
          'printed cards and past marks depend on them. Duplicate the drill and change the copy instead.',
        details: changed,
      });
    }
    Object.assign(drill, this.fields(input));
    return manager.getRepository(Drill).save(drill);
  }

  /** True when any assignment or any attempt (whatever its state) points at the drill. */
  private async isInUse(manager: EntityManager, id: string): Promise<boolean> {
    const [row] = await manager.query<{ used: boolean }[]>(
      `SELECT EXISTS (SELECT 1 FROM assignments WHERE drill_id = $1) OR EXISTS (SELECT 1 FROM attempts WHERE drill_id = $1) AS used`,
      [id],
    );
    return row.used;
  }

  /** A private copy in the caller's own library, to adapt. */
  async duplicate(caller: AuthUser, id: string): Promise<Drill> {
    const source = await this.findVisible(caller, id);
    return this.drillsRepository.save(
      this.drillsRepository.create({
        ownerId: caller.id,
        title: `${source.title} (copy)`.slice(0, 120),
        kind: source.kind,
        instructions: source.instructions,
        targets: source.targets,
        tolerance: source.tolerance,
        palette: source.palette,
        visibility: 'private',
      }),
    );
  }

  /** Soft delete: attempts and assignments made for it keep their drill. */
  async remove(owner: AuthUser, id: string): Promise<void> {
    await this.findOwned(owner, id);
    await this.drillsRepository.softDelete({ id });
  }

  async findOwned(owner: AuthUser, id: string): Promise<Drill> {
    const drill = await this.drillsRepository.findOneBy({ id });
    if (!drill || (owner.role !== 'admin' && drill.ownerId !== owner.id)) throw notFound();
    return drill;
  }

  private fields(input: CreateDrillInput) {
    return {
      title: input.title,
      kind: input.kind,
      instructions: input.instructions,
      targets: input.targets.map(normaliseTarget),
      tolerance: Object.fromEntries(Object.entries(input.tolerance ?? {}).filter(([, v]) => v !== undefined)),
      palette: input.palette,
      visibility: input.visibility as 'private' | 'public',
    };
  }

  private visibleTo(caller: AuthUser) {
    return new Brackets((where) => {
      if (caller.role === 'admin') {
        where.where('TRUE');
        return;
      }
      where
        .where('d.owner_id = :caller', { caller: caller.id })
        .orWhere("d.visibility = 'public'")
        .orWhere(
          `EXISTS (SELECT 1 FROM assignments a JOIN classes c ON c.id = a.class_id
                    LEFT JOIN class_members m ON m.class_id = c.id AND m.student_id = :caller
                    WHERE a.drill_id = d.id AND (c.teacher_id = :caller OR m.student_id IS NOT NULL))`,
          { caller: caller.id },
        );
    });
  }
}
