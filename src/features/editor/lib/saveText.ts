/** Hands text to the browser as a file download. Example: saveText("t,y\n0,0\n", "step.csv", "text/csv"). */
export function saveText(text: string, fileName: string, type = "text/csv"): void {
  const url = URL.createObjectURL(new Blob([text], { type: `${type};charset=utf-8` }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // Revoked a little later: some browsers read the URL after click() returns.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
