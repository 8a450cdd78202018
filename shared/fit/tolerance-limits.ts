/** Upper and lower deviation of a part from its nominal size, in µm (ISO 286 ES/EI or es/ei). */
export interface ToleranceLimits {
  /** Upper deviation in µm (ES for a hole, es for a shaft). */
  readonly upper: number;
  /** Lower deviation in µm (EI for a hole, ei for a shaft). */
  readonly lower: number;
}
