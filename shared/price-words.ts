/**
 * Price lines in words: the bill of materials and the price book write material ids
 * ("carbon-steel") and labour operations ("perTubeEnd") into line descriptions and sources; people
 * read "Carbon steel" and "per tube end". Applied when a line is shown (pages and PDFs), so stored
 * revisions read the same way.
 */
import { TUBE_MATERIALS } from './thermal/geometry/materials';

const LABOUR_WORDS: Record<string, string> = {
  perTubeEnd: 'per tube end',
  perBaffle: 'per baffle',
  perNozzle: 'per nozzle',
  fitUp: 'fit-up',
  hydrotest: 'hydrotest',
  paint: 'paint',
};

/** material id → its name as read mid-sentence ("carbon steel", "copper (C12200)") */
const MATERIAL_WORDS = new Map(TUBE_MATERIALS.map((m) => [m.id, m.name.charAt(0).toLowerCase() + m.name.slice(1)]));
const MATERIAL_ID = new RegExp(`(?<![\\w-])(${[...MATERIAL_WORDS.keys()].join('|')})(?![\\w-])`, 'g');

/** A line's description or source with codes turned into words (one pass, so a name is never re-read). */
export function priceLineText(text: string): string {
  return text
    .replace(MATERIAL_ID, (id) => MATERIAL_WORDS.get(id) ?? id)
    .replace(/labour hours (\w+)/g, (_all, op: string) => `labour hours ${LABOUR_WORDS[op] ?? op}`);
}
