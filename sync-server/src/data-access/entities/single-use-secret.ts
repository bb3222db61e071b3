import { Column, CreateDateColumn, PrimaryGeneratedColumn } from 'typeorm';

/**
 * Columns shared by secrets we hand out once and store only as a SHA-256 (refresh tokens,
 * reset links): when it was made, when it lapses, and when it was used.
 */
export abstract class SingleUseSecret {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'token_hash', type: 'text', unique: true })
  tokenHash: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;
}
