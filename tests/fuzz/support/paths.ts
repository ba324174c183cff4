/**
 * The quantity keys of a case document and their kinds (case-format.md), found by walking the document:
 * what a mutation may replace and which key path the refusal must then name.
 */
import { formatKeyPath, type KeyPath } from '../../../src/case/key-path.js';

export type Kind = 'length' | 'size' | 'tipSize' | 'temperature' | 'h' | 'k' | 'resistance' | 'emissivity' | 'exponent' | 'lawBase';

export interface QuantityPath {
  path: KeyPath;
  text: string;
  kind: Kind;
}

type Node = unknown;
const isRecord = (v: Node): v is Record<string, Node> => typeof v === 'object' && v !== null && !Array.isArray(v);

const positiveLengths = ['length', 'thickness', 'width', 'diameter', 'baseThickness', 'baseDiameter', 'innerRadius', 'outerRadius'];

/** Every quantity leaf of a valid case document with its kind. */
export function quantityPaths(doc: Record<string, Node>): QuantityPath[] {
  const out: QuantityPath[] = [];
  const add = (path: KeyPath, kind: Kind) => out.push({ path, text: formatKeyPath(path), kind });
  const fin = doc['fin'];
  if (isRecord(fin)) {
    for (const key of positiveLengths) if (key in fin) add(['fin', key], 'size');
    for (const key of ['tipThickness', 'tipDiameter']) if (key in fin) add(['fin', key], 'tipSize');
    const points = fin['points'];
    if (Array.isArray(points)) {
      points.forEach((_, i) => {
        add(['fin', 'points', i, 0], 'length');
        add(['fin', 'points', i, 1], i === points.length - 1 ? 'tipSize' : 'size');
      });
    }
  }
  const material = doc['material'];
  if (isRecord(material)) {
    const k = material['k'];
    if (isRecord(k) && Array.isArray(k['points'])) {
      k['points'].forEach((_, i) => {
        add(['material', 'k', 'points', i, 0], 'temperature');
        add(['material', 'k', 'points', i, 1], 'k');
      });
    } else add(['material', 'k'], 'k');
  }
  const convection = doc['convection'];
  if (isRecord(convection)) {
    add(['convection', 'ambient'], 'temperature');
    if ('surroundings' in convection) add(['convection', 'surroundings'], 'temperature');
    if ('emissivity' in convection) add(['convection', 'emissivity'], 'emissivity');
    const h = convection['h'];
    if (!isRecord(h)) add(['convection', 'h'], 'h');
    else if ('law' in h) {
      add(['convection', 'h', 'base'], 'lawBase');
      add(['convection', 'h', 'exponent'], 'exponent');
    } else if (Array.isArray(h['points'])) {
      h['points'].forEach((_, i) => {
        add(['convection', 'h', 'points', i, 0], 'length');
        add(['convection', 'h', 'points', i, 1], 'h');
      });
    } else {
      add(['convection', 'h', 'base'], 'h');
      add(['convection', 'h', 'tip'], 'h');
    }
    const tip = convection['tip'];
    if (isRecord(tip)) {
      if ('convective' in tip) add(['convection', 'tip', 'convective'], 'h');
      if ('temperature' in tip) add(['convection', 'tip', 'temperature'], 'temperature');
    }
  }
  const base = doc['base'];
  if (isRecord(base)) {
    add(['base', 'temperature'], 'temperature');
    if ('contactResistance' in base) add(['base', 'contactResistance'], 'resistance');
  }
  return out;
}

/** Every mapping of the document (where an unknown key can be added), with its path. */
export function mappingPaths(doc: Record<string, Node>): KeyPath[] {
  const out: KeyPath[] = [];
  const walk = (node: Node, path: KeyPath) => {
    if (isRecord(node)) {
      out.push(path);
      for (const [k, v] of Object.entries(node)) walk(v, [...path, k]);
    } else if (Array.isArray(node)) node.forEach((v, i) => walk(v, [...path, i]));
  };
  walk(doc, []);
  return out;
}

/** A deep copy of `doc` with `value` at `path` (undefined deletes the key). */
export function setAt(doc: Record<string, Node>, path: KeyPath, value: Node): Record<string, Node> {
  const copy = structuredClone(doc);
  let node: Node = copy;
  for (const segment of path.slice(0, -1)) node = (node as Record<string | number, Node>)[segment as string];
  const last = path[path.length - 1] as string | number;
  if (value === undefined && isRecord(node)) delete node[last as string];
  else (node as Record<string | number, Node>)[last as string] = value;
  return copy;
}

export function getAt(doc: Record<string, Node>, path: KeyPath): Node {
  let node: Node = doc;
  for (const segment of path) node = (node as Record<string | number, Node>)[segment as string];
  return node;
}
