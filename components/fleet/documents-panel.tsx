"use client";
import { FileText, Trash2, Upload } from "lucide-react";
import { useRouter } from "next/navigation";
import { useRef, useState, useTransition } from "react";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, Select, useToast } from "@/components/ui";
import type { VehicleDocument } from "@/lib/server/documents";
import { DOCUMENT_KINDS, DOCUMENT_KIND_WORDS } from "@/lib/validation/fleet";
import type { FormState } from "@/lib/validation/form-state";

const MAX_MB = 8;

function size(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

export interface DocumentsPanelProps {
  vehicleId: string;
  documents: VehicleDocument[];
  canEdit: boolean;
  deleteAction: (input: unknown) => Promise<FormState>;
}

/** The vehicle's label photos and PDFs: upload (type checked on the server from the bytes), open, remove. */
export function DocumentsPanel({ vehicleId, documents, canEdit, deleteAction }: DocumentsPanelProps) {
  const router = useRouter();
  const { toast } = useToast();
  const fileRef = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<string>("door-jamb-label");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [uploading, setUploading] = useState(false);
  const [pending, startTransition] = useTransition();

  const upload = async () => {
    setErrors({});
    setMessage(undefined);
    const file = fileRef.current?.files?.[0];
    if (!file) return setErrors({ file: ["Choose a photo or a PDF."] });
    if (file.size > MAX_MB * 1024 * 1024) return setErrors({ file: [`The file is larger than ${MAX_MB} MB. Take a smaller photo or scan.`] });
    const body = new FormData();
    body.set("vehicleId", vehicleId);
    body.set("kind", kind);
    body.set("file", file);
    setUploading(true);
    try {
      const response = await fetch("/api/v1/fleet/documents", { method: "POST", body });
      const answer = (await response.json().catch(() => ({}))) as { message?: string; fieldErrors?: Record<string, string[]> };
      if (!response.ok) {
        setErrors(answer.fieldErrors ?? {});
        setMessage(answer.message ?? `The server answered ${response.status}.`);
        return;
      }
      toast({ title: `Added ${file.name}.`, tone: "success" });
      if (fileRef.current) fileRef.current.value = "";
      router.refresh();
    } catch {
      setMessage("The upload did not reach the server. Check the connection and try again.");
    } finally {
      setUploading(false);
    }
  };

  const remove = (document: VehicleDocument) =>
    startTransition(async () => {
      const result = await deleteAction({ id: document.id });
      toast({ title: result.message ?? (result.ok ? "Removed." : "Not removed."), tone: result.ok ? "success" : "error" });
      if (result.ok) router.refresh();
    });

  return (
    <Card as="section" aria-labelledby="vehicle-documents">
      <CardHeader titleId="vehicle-documents" title="Labels and documents" description="Photos or PDFs of the door-jamb (tire and loading) label and the hitch label, so anyone can check a figure at its source." />
      <CardBody className="flex flex-col gap-4">
        {documents.length === 0 ? <p className="text-sm text-ink-soft">No documents yet.</p> : null}
        <ul className="divide-y divide-rule">
          {documents.map((document) => (
            <li key={document.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <a href={`/api/v1/fleet/documents/${document.id}?view=1`} target="_blank" rel="noreferrer" className="inline-flex min-w-0 items-center gap-2 text-accent-strong underline">
                <FileText aria-hidden="true" className="size-4 shrink-0" />
                <span className="truncate">{document.fileName}</span>
              </a>
              <span className="text-ink-soft">
                {DOCUMENT_KIND_WORDS[document.kind]} · <span className="num">{size(document.sizeBytes)}</span>
              </span>
              {canEdit ? (
                <Button size="sm" variant="quiet" icon={<Trash2 />} loading={pending} onClick={() => remove(document)} aria-label={`Remove ${document.fileName}`}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
        {canEdit ? (
          <div className="flex flex-col gap-3 border-t border-rule pt-4">
            <FormMessage tone="error">{message}</FormMessage>
            <div className="grid gap-4 sm:grid-cols-[16rem_1fr_auto] sm:items-end">
              <Field label="What it shows" error={errors.kind?.[0]}>
                <Select value={kind} onChange={(e) => setKind(e.target.value)}>
                  {DOCUMENT_KINDS.map((value) => (
                    <option key={value} value={value}>
                      {DOCUMENT_KIND_WORDS[value]}
                    </option>
                  ))}
                </Select>
              </Field>
              <Field label="Photo or PDF" help={`JPEG, PNG, WebP, HEIC or PDF, up to ${MAX_MB} MB.`} error={errors.file?.[0]}>
                <input ref={fileRef} type="file" accept="image/jpeg,image/png,image/webp,image/heic,application/pdf" className="text-sm file:mr-3 file:rounded-md file:border file:border-rule file:bg-panel file:px-3 file:py-2" />
              </Field>
              <Button icon={<Upload />} loading={uploading} onClick={() => void upload()}>
                Upload
              </Button>
            </div>
          </div>
        ) : null}
      </CardBody>
    </Card>
  );
}
