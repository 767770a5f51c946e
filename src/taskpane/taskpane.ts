// Placeholder task pane: reports whether it runs inside the spreadsheet or as a standalone page.
// The diagram pane replaces this file.

function showStatus(text: string): void {
  const status = document.getElementById("pane-status");
  if (status) status.textContent = text;
}

if (typeof Office !== "undefined") {
  void Office.onReady((info) => {
    // Outside Office, onReady resolves with host = null: the standalone mode.
    const where = info.host ? `in ${info.host}` : "as a standalone page";
    showStatus(`The potential–pH diagram is coming to this pane (running ${where}).`);
  });
} else {
  showStatus("The potential–pH diagram is coming to this pane (Office.js not loaded).");
}
