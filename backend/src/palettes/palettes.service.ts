import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { pigmentCautions, pigmentSafety, type PaintInput, type PigmentSafetyNote } from '@mixmark/common';
import { Repository } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import { Paint } from './entities/paint.entity';

export interface PaintView {
  id: string;
  name: string;
  pigments: string[];
  opacity: Paint['opacity'];
  staining: Paint['staining'];
  granulating: boolean;
  swatchLab: Paint['swatchLab'];
  /** Safety notes for the hazardous pigments this paint names. */
  safety: PigmentSafetyNote[];
}

export interface PaletteView {
  paints: PaintView[];
  /** The usual cautions, present when any paint names a hazardous pigment. */
  cautions: readonly string[];
}

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no paint with this id in your palette.' });

@Injectable()
export class PalettesService {
  constructor(@InjectRepository(Paint) private readonly paintsRepository: Repository<Paint>) {}

  async findAll(owner: AuthUser): Promise<PaletteView> {
    const paints = (await this.paintsRepository.find({ where: { ownerId: owner.id }, order: { createdAt: 'ASC' } })).map(toView);
    return { paints, cautions: paints.some((p) => p.safety.length > 0) ? pigmentCautions : [] };
  }

  async create(owner: AuthUser, input: PaintInput): Promise<PaintView> {
    return toView(await this.paintsRepository.save(this.paintsRepository.create({ ...input, ownerId: owner.id } as Partial<Paint>)));
  }

  async update(owner: AuthUser, id: string, input: PaintInput): Promise<PaintView> {
    const paint = await this.paintsRepository.findOneBy({ id, ownerId: owner.id });
    if (!paint) throw notFound();
    Object.assign(paint, input);
    return toView(await this.paintsRepository.save(paint));
  }

  async remove(owner: AuthUser, id: string): Promise<void> {
    const result = await this.paintsRepository.delete({ id, ownerId: owner.id });
    if (!result.affected) throw notFound();
  }
}

function toView(paint: Paint): PaintView {
  return {
    id: paint.id,
    name: paint.name,
    pigments: paint.pigments,
    opacity: paint.opacity,
    staining: paint.staining,
    granulating: paint.granulating,
    swatchLab: paint.swatchLab,
    safety: pigmentSafety(paint.pigments),
  };
}
