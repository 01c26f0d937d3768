/**
 * What the shop builds from: one record, rendered as the web page and as the PDF. Counts of tubes,
 * baffles and holes are PER SHELL; a cooler of N identical shells in series builds N of each shell
 * (`shells.inSeries`), and the totals say so (cut list, baffles, tubesheets).
 */

/** The fluid on one side: the process stream, the coolant, or a bath/condensing side (a wall boundary). */
export interface SideFluid {
  stream: 'process' | 'coolant' | 'wall';
  /** e.g. "Mineral oil ISO VG 46" */
  fluid: string;
}

export interface BuildSheet {
  order: { id: string; number: string; quoteNumber: string; customer: string; poNumber: string; needBy: string | null; quantity: number; status: string };
  design: {
    /** per shell */
    tubeCount: number;
    tubeOd: string;
    tubeWall: string;
    tubeMaterial: string;
    /** per shell */
    tubeLength_m: number;
    tubePasses: number;
    layout: number;
    pitch_mm: number;
    shell: string;
    shellInnerDiameter_mm: number;
    /** all shells */
    area_m2: number;
    shellsInSeries: number;
    areaPerShell_m2: number;
    /** issue 11: TEMA type (e.g. "BEU") and class, and why; designs stored before it read BEM, class C */
    construction?: string;
    temaClass?: string;
    constructionReason?: string;
  };
  /** identical shells in series: how many to build and how they connect */
  shells: {
    inSeries: number;
    /** "Build 2 identical shells …" in words */
    instruction: string;
    /** outlet of shell `from` to the inlet of shell `to`, one per side */
    interconnections: { from: number; to: number; side: 'tube' | 'shell'; nps: number }[];
  };
  /** which fluid goes where: for nozzle marking and the hydrotest of each side */
  allocation: { tubeSide: SideFluid; shellSide: SideFluid; reason: string };
  /** `tubes` and `cutLength_m` per shell; `tubesAllShells` and `totalLength_m` for the whole cooler */
  cutList: { tubes: number; cutLength_m: number; finishedLength_m: number; allowance_m: number; material: string; od: string; wall: string; totalLength_m: number; shells: number; tubesAllShells: number };
  billOfMaterials: { key: string; description: string; quantity: number; unit: string }[];
  labour: { key: string; description: string; hours: number }[];
  /** `count` per shell, `total` over all shells; spacings centre to centre, mm */
  baffles: { count: number; total: number; spacing_mm: number; inletSpacing_mm: number; outletSpacing_mm: number; cut_pct: number; cut_mm: number; thickness_mm: number };
  /** one tubesheet's drilling; `quantity` = 2 per shell × shells, all drilled alike */
  tubesheet: { holeCount: number; tieRodHoles: number; holeDiameter_mm: number; pitch_mm: number; layout: number; outerTubeLimit_mm: number; passLanes: number; thickness_mm: number; diameter_mm: number; quantity: number };
  /** `diameter_mm`: the hole's own (a tie rod's is the rod's); absent on sheets made before it */
  holes: { n: number; x_mm: number; y_mm: number; kind: 'tube' | 'tie-rod'; pass: number; diameter_mm?: number }[];
  /** per shell: in + out on each side; `fluid` is what the nozzle is marked for */
  nozzles: {
    side: 'tube' | 'shell'; nps: number; rating: string; fluid: string; perShell: number;
    /** issue 11, from the design's sized nozzles (one entry per side and role, perShell 1): absent on designs before it */
    role?: 'inlet' | 'outlet'; innerDiameter_mm?: number; velocity_m_s?: number; rhoV2?: number; impingementPlate?: boolean;
  }[];
  joint: string;
  /** each side at its own fluid's pressure; every shell is tested */
  hydrotest: { tubeSide_Pa: number; shellSide_Pa: number; tubeSideFluid: string; shellSideFluid: string; shells: number; basis: string };
  inspection: string[];
  cautions: string[];
}
