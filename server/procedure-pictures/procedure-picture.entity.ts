import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A picture for the checks of a procedure (a pin-out diagram, a photo of a connector). Documents refer to
 * it by id; any procedure of the shop may use it. There is no way to delete one, so a published version's
 * pictures never go. The bytes live beside the diagnosis photos, under a random storage key.
 */
@Entity('procedure_picture')
@Index(['shopId', 'createdAt'])
export class ProcedurePicture {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  /** The procedure it was uploaded for. */
  @Column('text')
  procedureId: string;

  @Column('text')
  storageKey: string;

  /** image/jpeg, image/png or image/webp, as sniffed from the bytes. */
  @Column('text')
  contentType: string;

  @Column('integer')
  size: number;

  @Column('text')
  uploadedById: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
