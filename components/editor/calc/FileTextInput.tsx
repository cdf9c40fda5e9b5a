'use client';

import { useRef, useState } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

/** Largest file read into a free-text input (the engine's largest, an orbit data message: lib/orbit-data ORBIT_MESSAGE_LIMITS); each kind bounds its own field further. */
const MAX_FILE_CHARS = 400_000;

/**
 * A free-text input that holds a whole file (a CCSDS OPM or OEM, a CSV site list):
 * a text area to paste into, and "Upload file…" that reads a local file into it as
 * text. Nothing is sent but the text; the server reads and checks it like pasted text.
 */
export function FileTextInput({
  id,
  editable,
  register,
  onText,
  invalid,
  describedBy,
  placeholder,
  maxLength,
}: {
  id: string;
  editable: boolean;
  register: UseFormRegisterReturn;
  onText: (text: string) => void;
  invalid: boolean;
  describedBy?: string;
  placeholder: string;
  maxLength?: number;
}) {
  const fileRef = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const read = async (file: File) => {
    setProblem(null);
    if (file.size > MAX_FILE_CHARS * 4)
      return setProblem(
        `${file.name} is ${file.size.toLocaleString('en-GB')} bytes; at most ${MAX_FILE_CHARS.toLocaleString('en-GB')} characters are accepted.`,
      );
    const text = await file.text();
    const limit = Math.min(MAX_FILE_CHARS, maxLength ?? MAX_FILE_CHARS);
    if (text.length > limit)
      return setProblem(
        `${file.name} has ${text.length.toLocaleString('en-GB')} characters; at most ${limit.toLocaleString('en-GB')} are accepted.`,
      );
    onText(text);
  };
  return (
    <div className="space-y-1">
      <textarea
        id={id}
        className="field h-32 w-full resize-y py-1 font-mono text-micro leading-snug"
        readOnly={!editable}
        spellCheck={false}
        wrap="off"
        placeholder={placeholder}
        maxLength={maxLength}
        aria-invalid={invalid}
        aria-describedby={describedBy}
        {...register}
      />
      {editable && (
        <div className="flex items-center gap-2">
          <button type="button" className="btn-quiet py-0.5 text-note" onClick={() => fileRef.current?.click()}>
            Upload file…
          </button>
          <input
            ref={fileRef}
            type="file"
            className="sr-only"
            accept=".opm,.oem,.kvn,.xml,.csv,.txt,text/plain,text/csv,application/xml"
            aria-label="File to read into the field"
            onChange={(e) => {
              const file = e.target.files?.[0];
              e.target.value = '';
              if (file) void read(file);
            }}
          />
          {problem && (
            <span role="alert" className="text-note text-ember-700">
              {problem}
            </span>
          )}
        </div>
      )}
    </div>
  );
}
