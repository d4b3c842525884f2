import { qrModules, qrPath } from './qr';

const QUIET_ZONE = 4; // modules of white around the symbol (ISO/IEC 18004 asks for four)

/** The case link as a QR code for the printed report; the link is printed as text beside it. */
export function CaseQr({ link }: { link: string }) {
  const m = qrModules(link);
  const side = m.size + 2 * QUIET_ZONE;
  return (
    <svg class="report-qr" viewBox={`0 0 ${side} ${side}`} role="img" aria-label="QR code of the case link" shape-rendering="crispEdges" data-testid="case-qr">
      <rect width={side} height={side} fill="#fff" />
      <path d={qrPath(m, QUIET_ZONE)} fill="#000" />
    </svg>
  );
}
