import { readFileSync } from 'node:fs';
import { prepareProblem } from '../src/stock/cutting-problem.ts';
import { arcFlowGraph } from '../src/stock/arc-flow-graph.ts';
const p = prepareProblem(JSON.parse(readFileSync(process.argv[2], 'utf8')));
const g = arcFlowGraph(p); console.log('nodes', g.nodes.length, 'arcs', g.arcs.length, 'grid', p.grid);
