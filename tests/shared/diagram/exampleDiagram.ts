/** The format spec's example document (an invented spindle speed loop), as a fresh copy each call. */
export function exampleDiagram(): Record<string, unknown> & { blocks: Record<string, unknown>[]; wires: Record<string, unknown>[]; parameters: Record<string, unknown> } {
  return JSON.parse(`{"format":"loopwright-diagram","version":1,"title":"Spindle speed loop",
 "parameters":{"K":4,"tau":{"value":0.5,"unit":"s","min":0.1,"max":2,"description":"motor time constant"}},
 "blocks":[{"id":"r","type":"input","label":"r"},{"id":"e","type":"sum","signs":["+","-"]},
  {"id":"c","type":"transfer","expr":"K*(s+2)/s"},{"id":"p","type":"transfer","expr":"1/(tau*s^2 + s)"},
  {"id":"h","type":"gain","expr":"0.5"},{"id":"y","type":"output","label":"y"}],
 "wires":[{"id":"w1","from":"r","to":"e","port":0},{"from":"e","to":"c"},{"from":"c","to":"p"},{"from":"p","to":"y"},
  {"from":"p","to":"h"},{"from":"h","to":"e","port":1}],"layout":{"r":{"x":0,"y":0}}}`);
}
