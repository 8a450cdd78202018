import { kitCautions } from '../kit/kit-cautions';
import type { CouponManifest } from './coupon-manifest';

const mm = (v: number) => `${v.toFixed(2)} mm`;

/**
 * README.txt of a fit-test coupon: what to print, the legend of marks → clearance, how to judge each pocket,
 * how to record the result, and the cautions.
 *
 * @param manifest - the coupon's manifest
 * @returns plain text with \n line ends
 */
export function couponReadme(manifest: CouponManifest): string {
  const joint = manifest.request.joint === 'key' ? 'registration key' : 'dovetail';
  const lines = [
    `SEAMWRIGHT FIT-TEST COUPON (${joint}, ${manifest.request.material}, ${manifest.request.process.toUpperCase()})`,
    '',
    'WHAT TO PRINT',
    ...manifest.parts.map((p) => `- ${p.file}: ${p.quantity} × (${p.note})`),
    '',
    'LEGEND: MARK ON THE PART → CLEARANCE PER SIDE',
    ...manifest.pockets.map((p) => `- ${p.mark}: ${mm(p.clearancePerSide)}${p.keyFile ? ` (use ${p.keyFile})` : ''}`),
    '',
    'PRINT NOTES',
    ...manifest.printNotes.map((n) => `- ${n}`),
    '',
    'RECORDING THE RESULT',
    '- Note for each mark whether the part did not go in, went in with force, was snug, slid freely or wobbled, and enter it for this printer and material in Seamwright. The tightest mark that went in with force is your press fit, the tightest snug one your glued fit, the tightest free one your slide fit.',
    '',
    ...manifest.warnings.map((w) => `Note: ${w}`),
    ...(manifest.warnings.length ? [''] : []),
    ...kitCautions(),
    '',
  ];
  return lines.join('\n');
}
