import QRCode from 'qrcode';
import { useEffect, useState } from 'react';

/** One address as a QR code, drawn as SVG and given as a data: address for an <img> (no markup injected). */
export async function qrCodeImage(address: string): Promise<string> {
  const svg = await QRCode.toString(address, { type: 'svg', errorCorrectionLevel: 'M', margin: 1 });
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}

/** QR codes of several addresses (the Sheets' one per plot), by address; empty until drawn. */
export function useQrCodes(addresses: string[]): ReadonlyMap<string, string> {
  const [codes, setCodes] = useState<ReadonlyMap<string, string>>(new Map());
  const key = addresses.join('\n');
  useEffect(() => {
    let current = true;
    void Promise.all(addresses.map(async (address) => [address, await qrCodeImage(address)] as const)).then((pairs) => {
      if (current) setCodes(new Map(pairs));
    });
    return () => {
      current = false;
    };
    // The addresses' text is the dependency: a new array of the same addresses draws nothing again.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return codes;
}
