"use client";

import Link from "next/link";
import type { ClipView } from "@/lib/clips/hooks";
import type { DropView } from "@/lib/drops/hooks";
import { groupDigits } from "@/lib/clips/words";
import { DropStateBadge } from "@/components/drops/drop-state";
import { PlaceDropForm } from "./place-drop-form";

export function DropRow({ drop, readyClips, canEdit, canRead }: { drop: DropView; readyClips: ClipView[]; canEdit: boolean; canRead: boolean }) {
  const name = `Drop ${drop.ordinal}`;
  return (
    <tr className="border-t border-ink-100 align-top">
      <th scope="row" className="whitespace-nowrap px-3 py-3 font-semibold">
        {name}
      </th>
      <td className="px-3 py-3">
        {drop.clip ? (
          <>
            <Link href={`/clips/${drop.clip.id}`} className="break-all font-semibold text-wick-700 underline">
              {drop.clip.name}
            </Link>
            {drop.placedByName && <p className="mt-0.5 text-xs text-ink-600">placed by {drop.placedByName}</p>}
          </>
        ) : (
          <span className="text-ink-600">not placed</span>
        )}
      </td>
      <td className="whitespace-nowrap px-3 py-3">{drop.startFrame === null ? "—" : groupDigits(drop.startFrame)}</td>
      <td className="px-3 py-3">
        <DropStateBadge drop={drop} />
      </td>
      {canEdit && (
        <td className="px-3 py-2">
          {readyClips.length > 0 ? <PlaceDropForm drop={drop} readyClips={readyClips} /> : <span className="text-ink-600">no recording ready yet</span>}
        </td>
      )}
      {canRead && (
        <td className="whitespace-nowrap px-3 py-3">
          {drop.clip && (
            <Link href={`/drops/${drop.id}`} aria-label={`Read ${name.toLowerCase()}`} className="font-semibold text-wick-700 underline">
              Read
            </Link>
          )}
        </td>
      )}
    </tr>
  );
}
