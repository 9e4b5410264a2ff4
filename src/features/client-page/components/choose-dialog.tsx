// The client's "Choose this option" dialog: confirm with an optional comment, then a thank-you
// leading to the next room still to choose.
import { useState, type FormEvent } from 'react';
import { MAX_COMMENT_LENGTH, type ClientOption, type ClientRoom } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextAreaField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { errorMessage, fieldError } from '../../../lib/api';
import { useChoose } from '../api/presentation';

/**
 * "Choose this option": a short confirmation with an optional comment, then a thank-you that
 * leads on to the next room still to choose.
 */
export function ChooseDialog({
  token,
  room,
  option,
  studioName,
  nextRoom,
  onClose,
  onGoTo,
}: {
  token: string;
  room: ClientRoom;
  option: ClientOption;
  studioName: string;
  nextRoom: ClientRoom | null;
  onClose: () => void;
  onGoTo: (roomId: string | 'welcome') => void;
}) {
  const choose = useChoose(token, room.id);
  const keepsComment = room.choice?.optionId === option.id;
  const [comment, setComment] = useState(keepsComment ? room.choice!.comment : '');
  const [done, setDone] = useState(false);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    choose.mutate({ optionId: option.id, comment }, { onSuccess: () => setDone(true) });
  };

  if (done) {
    return (
      <Dialog open onClose={onClose} title="Thank you">
        <p className="text-[15px] leading-relaxed">
          Your choice for the {room.name} is saved: <strong>{option.label}</strong>. {studioName} has been told.
        </p>
        <p className="mt-2 text-sm text-ink-soft">You can come back and change it until {studioName} confirms the choices.</p>
        <div className="mt-6 flex flex-wrap justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Stay in this room
          </Button>
          {nextRoom ? (
            <Button variant="primary" onClick={() => onGoTo(nextRoom.id)} autoFocus>
              Go on to {nextRoom.name}
            </Button>
          ) : (
            <Button variant="primary" onClick={() => onGoTo('welcome')} autoFocus>
              See all your choices
            </Button>
          )}
        </div>
      </Dialog>
    );
  }

  return (
    <Dialog open onClose={onClose} title="Choose this option">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <p className="text-[15px] leading-relaxed">
          For the <strong>{room.name}</strong> you are choosing <strong>{option.label}</strong>.
        </p>
        <TextAreaField
          label={`A comment for ${studioName} (optional)`}
          value={comment}
          maxLength={MAX_COMMENT_LENGTH}
          onChange={(e) => setComment(e.target.value)}
          placeholder="For example: could the rug be a little smaller?"
          error={fieldError(choose.error, 'comment')}
          autoFocus
        />
        {choose.isError && !fieldError(choose.error, 'comment') && <Notice tone="error">{errorMessage(choose.error)}</Notice>}
        <p className="text-sm text-ink-soft">{studioName} will be told. You can change your choice until they confirm it.</p>
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Not yet
          </Button>
          <Button type="submit" variant="primary" busy={choose.isPending}>
            Choose this option
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
