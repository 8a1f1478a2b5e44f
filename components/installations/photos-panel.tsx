"use client";
import { Camera, Upload } from "lucide-react";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, Select, useToast } from "@/components/ui";
import { PHOTO_KINDS, PHOTO_KIND_WORDS } from "@/lib/installations/words";
import type { InstallationPhoto } from "@/lib/server/installations";

const MAX_MB = 8;

/** Photos of the hitch label and the fitted hitch, kept in the same document store as the fleet's labels. */
export function PhotosPanel({ recordId, photos, canEdit }: { recordId: string; photos: InstallationPhoto[]; canEdit: boolean }) {
  const router = useRouter();
  const { toast } = useToast();
  const fileRef = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<string>("hitch-label");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [uploading, setUploading] = useState(false);

  const upload = async () => {
    setErrors({});
    setMessage(undefined);
    const file = fileRef.current?.files?.[0];
    if (!file) return setErrors({ file: ["Choose a photo or a PDF."] });
    if (file.size > MAX_MB * 1024 * 1024) return setErrors({ file: [`The file is larger than ${MAX_MB} MB. Take a smaller photo.`] });
    const body = new FormData();
    body.set("recordId", recordId);
    body.set("kind", kind);
    body.set("file", file);
    setUploading(true);
    try {
      const response = await fetch("/api/v1/installations/photos", { method: "POST", body });
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

  return (
    <Card as="section" aria-labelledby="installation-photos" className="no-print">
      <CardHeader titleId="installation-photos" title="Photos" description="The hitch label and the hitch as fitted, so a figure can be checked at its source." />
      <CardBody className="flex flex-col gap-4">
        {photos.length === 0 ? <p className="text-sm text-ink-soft">No photos yet.</p> : null}
        <ul className="divide-y divide-rule">
          {photos.map((photo) => (
            <li key={photo.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <a href={`/api/v1/installations/photos/${photo.id}?view=1`} target="_blank" rel="noreferrer" className="inline-flex min-w-0 items-center gap-2 text-accent-strong underline">
                <Camera aria-hidden="true" className="size-4 shrink-0" />
                <span className="truncate">{photo.fileName}</span>
              </a>
              <span className="text-ink-soft">{PHOTO_KIND_WORDS[photo.kind]}</span>
            </li>
          ))}
        </ul>
        {canEdit ? (
          <div className="flex flex-col gap-3 border-t border-rule pt-4">
            <FormMessage tone="error">{message}</FormMessage>
            <div className="grid gap-4 sm:grid-cols-[14rem_1fr_auto] sm:items-end">
              <Field label="What it shows" error={errors.kind?.[0]}>
                <Select value={kind} onChange={(e) => setKind(e.target.value)}>
                  {PHOTO_KINDS.map((value) => (
                    <option key={value} value={value}>
                      {PHOTO_KIND_WORDS[value]}
                    </option>
                  ))}
                </Select>
              </Field>
              <Field label="Photo" help={`JPEG, PNG, WebP, HEIC or PDF, up to ${MAX_MB} MB.`} error={errors.file?.[0]}>
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
