\\ Reference reduction of a Loopwright diagram with PARI/GP (Debian pari-gp), for the engine benchmark.
\\
\\ Independent of the TypeScript engine: one signal per block, an edge u -> b of weight gain(b) * sign for each
\\ wire into b, and the signals eliminated one at a time in a fill-reducing order chosen here (fewest
\\ in-edges x out-edges first, ties by block order), every weight an exact rational function that PARI keeps
\\ in lowest terms. The product of the pivots is det(I - A); times every block's denominator it is chi(s).
\\
\\ Read after an input file (tests/support/pari.ts writes it) that defines:
\\   BLOCKS = [[id, type, expr, signs], ...]   expr in GP syntax with exact numbers, "" when none
\\   WIRES  = [[from, to, port], ...]
\\   PAIR   = [input id, output id]
\\   OURS   = [numerator, denominator, chi] as GP text, or 0: compared with the reference when given
\\   REPEAT = timed batches of solves, each of at least 20 ms (0: one solve, printed: a whole-process run)
\\ Prints one JSON object: with REPEAT > 0 solveMs (wall time of one solve in the best batch: the document's gains,
\\ the graph, the order chosen here and the transfer), runs and degree (of the transfer's denominator in s), and with OURS
\\ also chiMs (chi from the pivots, once), agrees, lowestTerms and chiAgrees; with REPEAT = 0 the transfer's
\\ numerator and denominator.

s; \\ created first, so s is the main variable of every polynomial and every parameter ranks below it

gainOf(b) = {
  my(kind = b[2]);
  if (kind == "gain" || kind == "transfer", eval(b[3]), kind == "integrator", 1 / s, 1);
}

\\ w is added to the edge u -> v (a self-loop when u == v); an edge whose weight cancels to 0 goes away.
addEdge(u, v, w) = {
  my(old);
  if (u == v, LOOPS[u] += w; return);
  if (mapisdefined(OUTS[u], v, &old), w += old);
  if (w == 0,
    if (mapisdefined(OUTS[u], v), mapdelete(~OUTS[u], v); mapdelete(~INS[v], u)),
    mapput(~OUTS[u], v, w); mapput(~INS[v], u, w));
}

build() = {
  my(n = #BLOCKS, index = Map(), gains);
  for (i = 1, n, mapput(~index, BLOCKS[i][1], i));
  gains = vector(n, i, gainOf(BLOCKS[i]));
  OUTS = vector(n, i, Map());
  INS = vector(n, i, Map());
  LOOPS = vector(n, i, 0);
  for (k = 1, #WIRES,
    my(w = WIRES[k], u = mapget(index, w[1]), v = mapget(index, w[2]), signs = BLOCKS[v][4], sg = 1);
    if (#signs && signs[w[3] + 1] == "-", sg = -1);
    addEdge(u, v, sg * gains[v]));
  [index, gains];
}

\\ Removes signal n: every path a -> n -> b becomes part of the edge a -> b, divided by the pivot 1 - loop.
eliminate(n) = {
  my(into = Mat(INS[n]), from = Mat(OUTS[n]), pivot = 1 - LOOPS[n], scale);
  if (pivot == 0, error("zero pivot at block ", BLOCKS[n][1], ": an algebraic loop"));
  scale = 1 / pivot;
  for (i = 1, #into~, mapdelete(~OUTS[into[i, 1]], n));
  for (j = 1, #from~, mapdelete(~INS[from[j, 1]], n));
  INS[n] = Map(); OUTS[n] = Map(); LOOPS[n] = 0;
  for (i = 1, #into~,
    my(a = into[i, 1], wa = into[i, 2] * scale);
    for (j = 1, #from~, addEdge(a, from[j, 1], wa * from[j, 2])));
  pivot;
}

\\ The transfer PAIR[1] -> PAIR[2] and the pivots of every other signal, eliminated in Markowitz order.
reduceSignals() = {
  my(built = build(), index = built[1], gains = built[2], n = #BLOCKS, r = mapget(index, PAIR[1]), y = mapget(index, PAIR[2]));
  my(alive = vector(n, i, i != r && i != y), pivots = List(), left = n - 2, edge);
  while (left > 0,
    my(best = 0, cost = oo);
    for (i = 1, n, if (alive[i], my(c = #INS[i] * #OUTS[i]); if (c < cost, cost = c; best = i)));
    listput(~pivots, eliminate(best));
    alive[best] = 0;
    left--);
  [if (mapisdefined(OUTS[r], y, &edge), edge, 0), Vec(pivots), gains];
}

\\ Product by halves, so each multiplication (and its cancellation) is between factors of about the same size.
treeProd(v) = if (#v == 0, 1, #v == 1, v[1], my(h = #v \ 2); treeProd(v[1..h]) * treeProd(v[h + 1..#v]));

\\ The leading numeric coefficient: of the leading coefficient in s, then in each parameter in turn.
leadNumber(p) = { while (type(p) == "t_POL", p = pollead(p)); p; }

\\ chi = det(I - A) * (product of block denominators), as a primitive polynomial with a positive leading number.
chiOf(pivots, gains) = {
  my(chi = numerator(treeProd(concat(pivots, vector(#gains, i, denominator(gains[i]))))));
  chi = chi / content(chi);
  if (leadNumber(chi) < 0, -chi, chi);
}

\\ Proportional up to a factor free of s (the engine prints chi monic and without a parameter content).
freeOfS(x) = poldegree(numerator(x), s) == 0 && poldegree(denominator(x), s) == 0;

\\ One solve, printed (a whole-process run), or timed solves after an untimed one and the comparison with OURS.
main() = {
  my(result, T, t0, runs = 0, solveMs, out);
  if (REPEAT == 0,
    T = reduceSignals()[1];
    print("{\"numerator\": \"", numerator(T), "\", \"denominator\": \"", denominator(T), "\"}");
    return);
  \\ The clock counts whole ms: time batches of at least 20 ms and keep the best batch (the least disturbed).
  t0 = getwalltime();
  result = reduceSignals();
  my(batch = ceil(20 / max(getwalltime() - t0, 1/2)), best = oo);
  for (k = 1, REPEAT,
    t0 = getwalltime();
    for (j = 1, batch, result = reduceSignals());
    best = min(best, (getwalltime() - t0) / batch);
    runs += batch);
  solveMs = best;
  T = result[1];
  out = strprintf("{\"solveMs\": %.3f, \"runs\": %d, \"degree\": %d", solveMs, runs, poldegree(denominator(T), s));
  if (OURS != 0,
    my(num = eval(OURS[1]), den = eval(OURS[2]), ours = eval(OURS[3]), t1 = getwalltime(), chi = chiOf(result[2], result[3]));
    out = concat(out, strprintf(", \"chiMs\": %d, \"agrees\": %s, \"lowestTerms\": %s, \"chiAgrees\": %s",
      getwalltime() - t1,
      if (num * denominator(T) == numerator(T) * den, "true", "false"),
      if (num == 0 || poldegree(gcd(num, den), s) == 0, "true", "false"),
      if (ours != 0 && freeOfS(ours / chi), "true", "false"))));
  print(concat(out, "}"));
}

main();
quit;
