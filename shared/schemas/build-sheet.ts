/** What the shop builds from: one record, rendered as the web page and as the PDF. */
export interface BuildSheet {
  order: { id: string; number: string; quoteNumber: string; customer: string; poNumber: string; needBy: string | null; quantity: number; status: string };
  design: {
    tubeCount: number;
    tubeOd: string;
    tubeWall: string;
    tubeMaterial: string;
    tubeLength_m: number;
    tubePasses: number;
    layout: number;
    pitch_mm: number;
    shell: string;
    shellInnerDiameter_mm: number;
    area_m2: number;
  };
  cutList: { tubes: number; cutLength_m: number; finishedLength_m: number; allowance_m: number; material: string; od: string; wall: string; totalLength_m: number };
  billOfMaterials: { key: string; description: string; quantity: number; unit: string }[];
  labour: { key: string; description: string; hours: number }[];
  baffles: { count: number; spacing_mm: number; cut_pct: number; thickness_mm: number };
  tubesheet: { holeCount: number; tieRodHoles: number; holeDiameter_mm: number; pitch_mm: number; layout: number; outerTubeLimit_mm: number; passLanes: number; thickness_mm: number; diameter_mm: number };
  holes: { n: number; x_mm: number; y_mm: number; kind: 'tube' | 'tie-rod'; pass: number }[];
  nozzles: { side: 'tube' | 'shell'; nps: number; rating: string }[];
  joint: string;
  hydrotest: { tubeSide_Pa: number; shellSide_Pa: number; basis: string };
  inspection: string[];
  cautions: string[];
}
