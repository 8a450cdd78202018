import { AppError } from '../../errors/app-error';
import type { ResolvedKitRequest } from '../../../shared/schemas/kit-request';
import type { TeamMaterial } from '../../../shared/schemas/material';
import { teamMaterialTuning } from '../../../shared/library/team-material-tuning';

/**
 * Applies a team material to a kit request: its clearance adjustment for the request's fit class becomes
 * `materialTuning`, which replaces the built-in material's adjustment in the fit engine and names the team
 * material in the derivation. Without a team material the request keeps its own tuning (if any). A team
 * material based on another material than the request's is refused: its adjustment was chosen for that one.
 *
 * @throws AppError VALIDATION_FAILED when the team material's base material is not the request's material
 */
export function applyTeamMaterial(request: ResolvedKitRequest, material: TeamMaterial | null): ResolvedKitRequest {
  if (!material) return request;
  if (material.baseMaterial !== request.material) {
    throw new AppError(
      'VALIDATION_FAILED',
      `Team material "${material.name}" is based on ${material.baseMaterial}, but this kit is for ${request.material}.`,
      [
        {
          path: 'teamMaterialId',
          message: `Choose a team material based on ${request.material}, or none.`,
        },
      ],
    );
  }
  return { ...request, materialTuning: teamMaterialTuning(material, request.fit) };
}
