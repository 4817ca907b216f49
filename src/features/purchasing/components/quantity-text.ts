/** A need or order quantity with its unit; fabric (mm) shown in metres. */
export const quantityText = (q: number, unit: string) => (unit === 'mm' ? `${(q / 1000).toFixed(1)} m` : `${+q.toFixed(3)} ${unit}`);
