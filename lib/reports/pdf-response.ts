/** A PDF download response with a file name reduced to safe characters. */
export function safeFileName(name: string): string {
  const cleaned = name.normalize("NFKD").replace(/[^\w.-]+/g, "-").replace(/-+/g, "-").replace(/^-+|-+$/g, "");
  return cleaned.slice(0, 120) || "package.pdf";
}

export function pdfResponse(pdf: Buffer, fileName: string): Response {
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${safeFileName(fileName)}"`,
      "content-length": String(pdf.length),
      "cache-control": "no-store",
    },
  });
}
